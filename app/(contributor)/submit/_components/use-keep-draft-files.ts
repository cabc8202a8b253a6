"use client";
// Tells the server that the draft in this browser is still open — when the form is opened and when the tab
// comes back into view (at most hourly) — so the storage sweep keeps its uploaded files; reports those gone.
import { useEffect, useEffectEvent, useRef } from "react";
import type { KeptDraftFiles } from "@/server/submissions/draft-files";
import { keepDraftFiles } from "../actions/keep-draft-files";

const EVERY_MS = 60 * 60 * 1000;

export function useKeepDraftFiles(
  active: boolean,
  files: () => { logKey: string | null; photoKeys: string[] },
  onResult: (kept: KeptDraftFiles) => void,
) {
  const last = useRef(0);
  // An effect event reads the latest files and callback without restarting the effect on every render.
  const keep = useEffectEvent(async () => {
    const f = files();
    if (!f.logKey && f.photoKeys.length === 0) return;
    if (Date.now() - last.current < EVERY_MS) return;
    last.current = Date.now();
    const res = await keepDraftFiles(null, f);
    if (res.ok) onResult(res.data);
  });
  useEffect(() => {
    if (!active) return;
    const visible = () => {
      if (document.visibilityState === "visible") void keep();
    };
    void keep();
    document.addEventListener("visibilitychange", visible);
    return () => document.removeEventListener("visibilitychange", visible);
  }, [active]);
}
