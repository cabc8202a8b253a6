"use client";
// The submission draft kept in this browser between visits: the form values (the uploaded log's storage
// key among them, so a reload does not lose the upload) and the step reached. Cleared after submitting.
import { useCallback, useEffect, useRef } from "react";
import { z } from "zod";

const draftSchema = z.object({
  version: z.literal(1),
  step: z.number().int().min(0).max(3),
  values: z.record(z.string(), z.unknown()),
  savedAt: z.string(),
});
export type Draft = { step: number; values: Record<string, unknown> };

export function draftKey(userId: string, scope = "new"): string {
  return `sagline:submit-draft:${userId}:${scope}`;
}

export function readDraft(key: string): Draft | null {
  try {
    const raw = window.localStorage.getItem(key);
    if (!raw) return null;
    const parsed = draftSchema.safeParse(JSON.parse(raw));
    return parsed.success ? { step: parsed.data.step, values: parsed.data.values } : null;
  } catch {
    return null; // private mode or a corrupt entry: start afresh
  }
}

/** Saves the draft (debounced, and at once when the page is hidden or unloaded); `clear` removes it. */
export function useDraftStorage(key: string) {
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const pending = useRef<Draft | null>(null);
  const write = useCallback(() => {
    if (timer.current) clearTimeout(timer.current);
    timer.current = null;
    const draft = pending.current;
    pending.current = null;
    if (!draft) return;
    try {
      window.localStorage.setItem(key, JSON.stringify({ version: 1, ...draft, savedAt: new Date().toISOString() }));
    } catch {
      // storage full or blocked: the form still works, only the draft is not kept
    }
  }, [key]);
  const save = useCallback(
    (draft: Draft) => {
      pending.current = draft;
      if (timer.current) clearTimeout(timer.current);
      timer.current = setTimeout(write, 300);
    },
    [write],
  );
  const clear = useCallback(() => {
    if (timer.current) clearTimeout(timer.current);
    pending.current = null;
    try {
      window.localStorage.removeItem(key);
    } catch {
      // nothing to clear
    }
  }, [key]);
  useEffect(() => {
    // A reload or a closed tab right after a change (an upload finishing) must not lose it.
    const flush = () => write();
    const hidden = () => {
      if (document.visibilityState === "hidden") write();
    };
    window.addEventListener("pagehide", flush);
    document.addEventListener("visibilitychange", hidden);
    return () => {
      window.removeEventListener("pagehide", flush);
      document.removeEventListener("visibilitychange", hidden);
      write();
    };
  }, [write]);
  return { save, clear };
}
