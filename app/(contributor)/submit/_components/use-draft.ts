"use client";
// The submission draft kept in this browser between visits: the form values (the uploaded log's storage
// key among them, so a reload does not lose the upload) and the step reached. Cleared after submitting.
import { useCallback, useEffect, useRef } from "react";
import { z } from "zod";

const draftSchema = z.object({ version: z.literal(1), step: z.number().int().min(0).max(3), values: z.record(z.string(), z.unknown()), savedAt: z.string() });
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

/** Saves the draft (debounced) whenever `save` is called; `clear` removes it. */
export function useDraftStorage(key: string) {
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const save = useCallback(
    (draft: Draft) => {
      if (timer.current) clearTimeout(timer.current);
      timer.current = setTimeout(() => {
        try {
          window.localStorage.setItem(key, JSON.stringify({ version: 1, ...draft, savedAt: new Date().toISOString() }));
        } catch {
          // storage full or blocked: the form still works, only the draft is not kept
        }
      }, 300);
    },
    [key],
  );
  const clear = useCallback(() => {
    if (timer.current) clearTimeout(timer.current);
    try {
      window.localStorage.removeItem(key);
    } catch {
      // nothing to clear
    }
  }, [key]);
  useEffect(() => () => {
    if (timer.current) clearTimeout(timer.current);
  }, []);
  return { save, clear };
}
