/** The Sagline mark: a flat rest line that sags under load and levels off — a discharge curve. */
export function Logo({ className = "" }: { className?: string }) {
  return (
    <span className={`inline-flex items-center gap-2 ${className}`}>
      <svg viewBox="0 0 32 20" width="32" height="20" aria-hidden="true" className="shrink-0">
        <path
          d="M1 4 H9 L11 11 C14 13 22 13 27 14 L29 18"
          fill="none"
          stroke="currentColor"
          strokeWidth="2.4"
          strokeLinecap="round"
          strokeLinejoin="round"
          className="text-charge-500"
        />
        <circle cx="9" cy="4" r="2" className="fill-cell-500" />
      </svg>
      <span className="text-lg font-bold tracking-tight">Sagline</span>
    </span>
  );
}
