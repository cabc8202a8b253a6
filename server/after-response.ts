// Work that must not hold up or undo the response (sending queued mail, removing draft files): Next runs
// it after the response is sent; outside a request (scripts, tests) it runs in the background, and
// settleAfterResponse() waits for it.
import "server-only";
import { after } from "next/server";

const running = new Set<Promise<void>>();

export function afterResponse(task: () => Promise<unknown>): void {
  const run = () =>
    task().then(
      () => undefined,
      (err: unknown) => {
        console.error("[after-response]", err instanceof Error ? err.message : err);
      },
    );
  try {
    after(run);
  } catch {
    const p = run().finally(() => running.delete(p));
    running.add(p);
  }
}

/** Waits for background work started outside a request (tests). */
export async function settleAfterResponse(): Promise<void> {
  while (running.size > 0) await Promise.all([...running]);
}
