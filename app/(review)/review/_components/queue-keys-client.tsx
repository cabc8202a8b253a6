"use client";
import { useEffect } from "react";

/** j / k move between the queue's rows (Enter opens the focused one); / jumps to the filters. */
export function QueueKeys() {
  useEffect(() => {
    function onKey(e: KeyboardEvent) {
      const t = e.target as HTMLElement | null;
      if (e.metaKey || e.ctrlKey || e.altKey || (t && /^(INPUT|SELECT|TEXTAREA)$/.test(t.tagName))) return;
      if (e.key === "/") {
        e.preventDefault();
        document.getElementById("filter-flag")?.focus();
        return;
      }
      if (e.key !== "j" && e.key !== "k") return;
      const rows = [...document.querySelectorAll<HTMLAnchorElement>("[data-queue-link]")];
      if (rows.length === 0) return;
      const at = rows.indexOf(document.activeElement as HTMLAnchorElement);
      const next = e.key === "j" ? Math.min(rows.length - 1, at + 1) : Math.max(0, at === -1 ? 0 : at - 1);
      rows[next]?.focus();
      e.preventDefault();
    }
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, []);
  return null;
}
