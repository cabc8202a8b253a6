// Local stand-in for an SMTP relay: accepts every message on 127.0.0.1 and stores it as files in
// MAIL_CATCHER_DIR (raw .eml plus a parsed .json), where the dev mail page and browser tests read them.
import { SMTPServer } from "smtp-server";
import { simpleParser } from "mailparser";
import fs from "node:fs";
import path from "node:path";

const port = Number(process.env.SMTP_PORT ?? 2525);
const dir = path.resolve(process.env.MAIL_CATCHER_DIR ?? ".mail");
fs.mkdirSync(dir, { recursive: true });

const server = new SMTPServer({
  secure: false,
  authOptional: true,
  disabledCommands: ["STARTTLS"],
  logger: false,
  size: 10 * 1024 * 1024,
  onAuth(_auth, _session, cb) {
    cb(null, { user: "local" });
  },
  onData(stream, session, cb) {
    const chunks = [];
    stream.on("data", (c) => chunks.push(c));
    stream.on("end", async () => {
      try {
        const raw = Buffer.concat(chunks);
        const parsed = await simpleParser(raw);
        const id = `${Date.now()}-${Math.random().toString(36).slice(2, 8)}`;
        const to = session.envelope.rcptTo.map((r) => r.address);
        fs.writeFileSync(path.join(dir, `${id}.eml`), raw);
        const record = {
          id,
          to,
          from: session.envelope.mailFrom ? session.envelope.mailFrom.address : null,
          subject: parsed.subject ?? "",
          text: parsed.text ?? "",
          html: typeof parsed.html === "string" ? parsed.html : null,
          receivedAt: new Date().toISOString(),
        };
        // Write then rename so readers never see half a file.
        fs.writeFileSync(path.join(dir, `${id}.json.tmp`), JSON.stringify(record, null, 2));
        fs.renameSync(path.join(dir, `${id}.json.tmp`), path.join(dir, `${id}.json`));
        cb();
      } catch (err) {
        cb(err);
      }
    });
  },
});

let listening = false;
server.on("error", (err) => {
  console.error(`mail catcher: ${err.message}`);
  // Before listening (port taken) the catcher cannot work; afterwards a client's dropped connection
  // (ECONNRESET) is that client's problem and must not take the catcher down for everyone else.
  if (!listening) process.exit(1);
});
server.listen(port, "127.0.0.1", () => {
  listening = true;
  console.log(`mail catcher listening on 127.0.0.1:${port}, storing in ${dir}`);
});
for (const sig of ["SIGTERM", "SIGINT"]) process.on(sig, () => server.close(() => process.exit(0)));
