// npm run mail:flush — send the outbox's due messages once and exit (the mail worker does this continuously;
// this is for a host without the worker, or to push the queue by hand). Prints one line; exits non-zero only
// when the database is unreachable.
import { closeDb } from "@/db";
import { deliverDueMail } from "@/server/mail/outbox";

async function flushAll(): Promise<{ sent: number; failed: number }> {
  let sent = 0;
  let failed = 0;
  for (;;) {
    const round = await deliverDueMail();
    sent += round.sent;
    failed += round.failed;
    if (round.sent + round.failed === 0) return { sent, failed };
  }
}

flushAll()
  .then(({ sent, failed }) => console.log(`sagline: mail outbox flushed (${sent} sent, ${failed} still queued)`))
  .catch((err: unknown) => {
    console.error(
      `sagline: error: could not flush the mail outbox: ${err instanceof Error ? err.message : String(err)}`,
    );
    process.exitCode = 1;
  })
  .finally(() => closeDb());
