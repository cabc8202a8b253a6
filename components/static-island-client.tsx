"use client";
// The client half of a static island (static-island.tsx): the server render fills it from the process's
// store; in the browser it keeps the markup the HTML brought (React does not compare or replace
// dangerouslySetInnerHTML when it hydrates). Reached by client-side navigation instead, the markup is not
// in the page: the page is loaded whole, which brings it.
import { useEffect } from "react";

function serverMarkup(k: string): string {
  const g = globalThis as typeof globalThis & { __saglineIslands?: Map<string, string> };
  const html = g.__saglineIslands?.get(k);
  if (html === undefined) console.error(`[static-island] no markup kept for ${k}`);
  return html ?? "";
}

export function StaticIslandClient({ id, k, className }: { id: string; k: string; className?: string }) {
  let html: string | null;
  if (typeof window === "undefined") html = serverMarkup(k);
  else {
    const el = document.getElementById(id);
    html = el?.dataset.k === k ? el.innerHTML : null;
  }
  useEffect(() => {
    if (html === null) window.location.reload();
  }, [html]);
  return <div id={id} data-k={k} className={className} dangerouslySetInnerHTML={{ __html: html ?? "" }} />;
}
