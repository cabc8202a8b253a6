"use client";
// A snippet to paste (the embed frame, or the plain image) with a copy button (falls back to selecting the text where the clipboard is refused).
import { useRef, useState } from "react";

type Props = { snippet: string; id?: string; label?: string; hint?: string; copyLabel?: string };

export function EmbedSnippet({
  snippet,
  id = "embed-snippet",
  label = "Embed snippet",
  copyLabel = "Copy snippet",
  hint = "Paste it into your page; the frame resizes itself to the chart.",
}: Props) {
  const ref = useRef<HTMLTextAreaElement>(null);
  const [copied, setCopied] = useState(false);
  async function copy() {
    ref.current?.select();
    try {
      await navigator.clipboard.writeText(snippet);
      setCopied(true);
    } catch {
      setCopied(false);
    }
  }
  return (
    <div className="space-y-2">
      <label htmlFor={id} className="text-sm font-medium">
        {label}
      </label>
      <textarea
        id={id}
        ref={ref}
        readOnly
        value={snippet}
        rows={4}
        className="num block w-full rounded border border-ink/20 bg-paper-sunk p-2 text-xs dark:border-night-line dark:bg-night-sunk"
        onFocus={(e) => e.currentTarget.select()}
      />
      <button
        type="button"
        onClick={copy}
        className="rounded border border-cell-600 px-3 py-1 text-sm font-medium text-cell-700 hover:bg-cell-50 dark:text-cell-400 dark:hover:bg-night-sunk"
      >
        {copied ? "Copied" : copyLabel}
      </button>
      <p className="muted text-xs" aria-live="polite">
        {copied ? "The snippet is on your clipboard." : hint}
      </p>
    </div>
  );
}
