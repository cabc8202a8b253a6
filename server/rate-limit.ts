// Fixed-window rate limits kept in PostgreSQL, so every app instance sees the same counts.
import "server-only";
import { hitRateLimit } from "@/db/mutations/rate-limits";
import { env } from "@/server/env";
import { AppError } from "@/lib/errors";

export type Limit = { limit: number; windowS: number };

export const limits = {
  signInPerEmail: { limit: 5, windowS: 15 * 60 },
  signInPerIp: { limit: 20, windowS: 15 * 60 },
  submitPerUser: { limit: 20, windowS: 60 * 60 },
  uploadPerUser: { limit: 60, windowS: 60 * 60 },
  keepDraftPerUser: { limit: 30, windowS: 60 * 60 },
  analysePerIp: { limit: 30, windowS: 60 },
  analysePerUser: { limit: 60, windowS: 60 },
  flagPerUser: { limit: 10, windowS: 60 * 60 },
  flagPerIp: { limit: 20, windowS: 60 * 60 },
  chartSavePerUser: { limit: 20, windowS: 60 * 60 },
  apiPerIp: { limit: 600, windowS: 60 },
} as const satisfies Record<string, Limit>;

/** Counts one hit; throws a 429 AppError with Retry-After once the window is full. */
export async function enforceRateLimit(key: string, { limit, windowS }: Limit): Promise<void> {
  if (env().SAGLINE_RATE_LIMITS === "off") return;
  const { count, resetAt } = await hitRateLimit(key, windowS);
  if (count > limit) {
    throw new AppError(
      "rate_limited",
      "Too many requests — please wait a little and try again.",
      undefined,
      (resetAt.getTime() - Date.now()) / 1000,
    );
  }
}
