// npm run mail:flush — send the outbox's due messages once (cron-able; the app also flushes after each
// successful send). Prints one line; exits non-zero only when the database is unreachable.
import { closeDb } from "@/db";
import { flushOutbox } from "@/server/mail/outbox";

flushOutbox()
  .then(({ sent, failed }) => console.log(`sagline: mail outbox flushed (${sent} sent, ${failed} still queued)`))
  .catch((err: unknown) => {
    console.error(
      `sagline: error: could not flush the mail outbox: ${err instanceof Error ? err.message : String(err)}`,
    );
    process.exitCode = 1;
  })
  .finally(() => closeDb());
