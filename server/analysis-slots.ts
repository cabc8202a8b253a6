// How many analyses of strangers' logs run at once in this process (ANALYSE_MAX_CONCURRENT, default 2). A
// log of tens of megabytes keeps a core busy for seconds; past the cap a visitor is told to come back
// (503 + Retry-After) instead of slowing every other page. Per process on purpose: each instance protects
// its own CPU. Signed-in contributors' uploads are limited per account instead.
import "server-only";
import { AppError } from "@/lib/errors";
import { env } from "@/server/env";

/** Seconds a refused visitor is asked to wait: about one large analysis. */
export const ANALYSIS_RETRY_AFTER_S = 5;

let running = 0;

/** Runs `work` in one of the slots, or throws 503 at once when all are taken (nobody queues). */
export async function withAnalysisSlot<T>(work: () => Promise<T>): Promise<T> {
  if (running >= env().ANALYSE_MAX_CONCURRENT) {
    throw new AppError(
      "unavailable",
      "Sagline is analysing other logs right now. Please try again in a few seconds, or sign in to analyse without waiting.",
      undefined,
      ANALYSIS_RETRY_AFTER_S,
    );
  }
  running++;
  try {
    return await work();
  } finally {
    running--;
  }
}
