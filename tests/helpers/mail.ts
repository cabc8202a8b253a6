// Reads what the local mail catcher (started by scripts/test.sh) stored for an address.
import fs from "node:fs";
import path from "node:path";

const dir = path.resolve(process.cwd(), process.env.MAIL_CATCHER_DIR ?? ".mail");

export type Caught = {
  id: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
  receivedAt: string;
};

export function caughtFor(address: string): Caught[] {
  if (!fs.existsSync(dir)) return [];
  return fs
    .readdirSync(dir)
    .filter((f) => f.endsWith(".json"))
    .map((f) => JSON.parse(fs.readFileSync(path.join(dir, f), "utf8")) as Caught)
    .filter((m) => m.to.includes(address))
    .sort((a, b) => b.id.localeCompare(a.id, "en", { numeric: true }));
}

/** Waits for the newest message to an address (the catcher writes it a moment after SMTP says OK). */
export async function newestMailFor(address: string, timeoutMs = 5000): Promise<Caught> {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const [m] = caughtFor(address);
    if (m) return m;
    if (Date.now() > until) throw new Error(`no mail caught for ${address}`);
    await new Promise((r) => setTimeout(r, 50));
  }
}

export function firstLink(text: string): string {
  const m = /https?:\/\/\S+/.exec(text);
  if (!m) throw new Error("no link in the message");
  return m[0];
}
