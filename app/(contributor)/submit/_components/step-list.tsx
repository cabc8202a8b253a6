"use client";
// The steps of the form as a list: done steps can be revisited; the current one is marked for screen readers.
export function StepList({
  steps,
  current,
  onGo,
}: {
  steps: readonly string[];
  current: number;
  onGo: (to: number) => void;
}) {
  return (
    <ol className="grid grid-cols-2 gap-2 text-sm sm:grid-cols-4" aria-label="Steps">
      {steps.map((label, i) => {
        const state = i < current ? "done" : i === current ? "current" : "todo";
        return (
          <li key={label}>
            <button
              type="button"
              onClick={() => onGo(i)}
              disabled={i > current}
              aria-current={state === "current" ? "step" : undefined}
              className={`flex w-full items-center gap-2 rounded-md border px-3 py-2 text-left ${
                state === "current"
                  ? "border-charge-500 bg-charge-50 font-medium dark:bg-charge-700/20"
                  : state === "done"
                    ? "border-cell-500/50 hover:bg-paper-sunk dark:hover:bg-night-sunk"
                    : "border-ink/10 text-ink-faint dark:border-night-line dark:text-paper/50"
              }`}
            >
              <span
                aria-hidden="true"
                className={`num flex h-6 w-6 shrink-0 items-center justify-center rounded-full text-xs ${state === "done" ? "bg-cell-500 text-paper" : state === "current" ? "bg-charge-500 text-night" : "bg-paper-sunk dark:bg-night-sunk"}`}
              >
                {state === "done" ? "✓" : i + 1}
              </span>
              <span>{label}</span>
            </button>
          </li>
        );
      })}
    </ol>
  );
}
