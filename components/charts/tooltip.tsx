"use client";
/** A small positioned note beside a chart point; it flips left near the right edge. Esc closes it (handled by the chart). */
export function Tooltip({
  left,
  top,
  containerWidth,
  children,
}: {
  left: number;
  top: number;
  containerWidth: number;
  children: React.ReactNode;
}) {
  const flip = left > containerWidth - 230;
  return (
    <div
      role="status"
      aria-live="polite"
      className="pointer-events-none absolute z-10 max-w-[220px] rounded-md border border-ink/15 bg-paper-raised px-2 py-1.5 text-xs shadow-lg dark:border-night-line dark:bg-night-sunk"
      style={{
        left: flip ? undefined : left + 12,
        right: flip ? containerWidth - left + 12 : undefined,
        top: Math.max(0, top - 20),
      }}
    >
      {children}
    </div>
  );
}
