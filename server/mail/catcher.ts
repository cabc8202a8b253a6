// Reads the local mail catcher's folder (MAIL_CATCHER_DIR, relative to the repo root): one <id>.json per
// caught message. Used by the dev mail page and by tests; never by production features.
import "server-only";
import fs from "node:fs/promises";
import path from "node:path";
import { z } from "zod";
import { env } from "@/server/env";

const caughtMailId = z.string().regex(/^[0-9]{10,16}-[a-z0-9]{1,12}$/, "Not a caught-mail id");

const caughtMail = z.object({
  id: caughtMailId,
  to: z.array(z.string()),
  from: z.string().nullable(),
  subject: z.string(),
  text: z.string(),
  html: z.string().nullable(),
  receivedAt: z.string(),
});
export type CaughtMail = z.infer<typeof caughtMail>;

function catcherDir(): string {
  return path.resolve(/*turbopackIgnore: true*/ process.cwd(), env().MAIL_CATCHER_DIR);
}

async function readOne(dir: string, file: string): Promise<CaughtMail | null> {
  try {
    const parsed = caughtMail.safeParse(JSON.parse(await fs.readFile(path.join(dir, file), "utf8")));
    return parsed.success ? parsed.data : null;
  } catch {
    return null; // a file removed or half-written meanwhile
  }
}

/** Caught messages, newest first. A missing folder means no mail yet. */
export async function listCaughtMail(limit = 200): Promise<CaughtMail[]> {
  const dir = catcherDir();
  let files: string[];
  try {
    files = (await fs.readdir(dir)).filter((f) => f.endsWith(".json"));
  } catch {
    return [];
  }
  // Ids start with the arrival time in milliseconds, so a reverse name sort is newest first.
  files.sort((a, b) => b.localeCompare(a, "en", { numeric: true }));
  const out: CaughtMail[] = [];
  for (const f of files.slice(0, limit)) {
    const m = await readOne(dir, f);
    if (m) out.push(m);
  }
  return out;
}

export async function getCaughtMail(id: string): Promise<CaughtMail | null> {
  const parsed = caughtMailId.safeParse(id);
  if (!parsed.success) return null;
  return readOne(catcherDir(), `${parsed.data}.json`);
}

/** Splits text into plain runs and http(s) links so a page can render the links clickable. */
export function linkify(text: string): { text: string; href?: string }[] {
  const parts: { text: string; href?: string }[] = [];
  const re = /https?:\/\/[^\s<>"']+/g;
  let last = 0;
  for (const m of text.matchAll(re)) {
    const at = m.index ?? 0;
    if (at > last) parts.push({ text: text.slice(last, at) });
    parts.push({ text: m[0], href: m[0] });
    last = at + m[0].length;
  }
  if (last < text.length) parts.push({ text: text.slice(last) });
  return parts;
}
