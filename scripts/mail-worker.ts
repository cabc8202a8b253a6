// The mail worker: sends what requests queued in mail_outbox (server/mail/worker.ts). Started in the
// background by npm start (and by npm test for the browser tests) with setsid and a pid file; npm run stop
// ends it with SIGTERM, after which it finishes the message in hand and exits. One line per event on stdout.
import { closeDb } from "@/db";
import { env } from "@/server/env";
import { runMailWorker } from "@/server/mail/worker";

const stop = new AbortController();
for (const sig of ["SIGTERM", "SIGINT"] as const) process.on(sig, () => stop.abort());

let announced = false;
runMailWorker({
  databaseUrl: env().DATABASE_URL,
  signal: stop.signal,
  onListening: () => {
    console.log(
      `sagline: mail worker listening (${announced ? "reconnected" : "ready"}), sending through ${env().SMTP_URL}`,
    );
    announced = true;
  },
})
  .then(() => console.log("sagline: mail worker stopped"))
  .catch((err: unknown) => {
    console.error(`sagline: error: mail worker: ${err instanceof Error ? err.message : String(err)}`);
    process.exitCode = 1;
  })
  .finally(() => closeDb());
