// Server-rendered markup that is sent once. Next.js sends every server component's output twice: as HTML and
// again in the page's RSC payload (React's copy for hydration and client navigation), so a chart's points and
// table would travel twice. A static island is written out here (components/charts/draw/markup.ts), kept in
// this process under a hash of its markup, and handed to the client component as that hash only; server
// rendering looks the markup up (the RSC and HTML renders of one request run in this same process), and the
// browser keeps what the HTML brought (static-island-client.tsx). Its content must be plain markup: host
// elements and hook-free function components, no client components inside.
import "server-only";
import { createHash } from "node:crypto";
import type { ReactNode } from "react";
import { toMarkup } from "@/components/charts/draw/markup";
import { StaticIslandClient } from "./static-island-client";

const MAX_ENTRIES = 1000;
type Store = Map<string, string>;
const store = (): Store => {
  const g = globalThis as typeof globalThis & { __saglineIslands?: Store };
  return (g.__saglineIslands ??= new Map());
};

/** Keeps `html` under its hash (the least recently kept entries go first) and returns the hash. */
function keepIsland(html: string): string {
  const k = createHash("sha256").update(html).digest("base64url").slice(0, 22);
  const s = store();
  s.delete(k);
  s.set(k, html);
  for (const oldest of s.keys()) {
    if (s.size <= MAX_ENTRIES) break;
    s.delete(oldest);
  }
  return k;
}

export function StaticIsland({ id, className, children }: { id: string; className?: string; children: ReactNode }) {
  return <StaticIslandClient id={id} k={keepIsland(toMarkup(children))} className={className} />;
}
