// Small form pieces shared by every form: a labelled field with hint and error, input styles, alerts and
// buttons. Plain components (no state), usable from server and client components alike.
import type { ReactNode } from "react";

export const inputClass =
  "block w-full rounded-md border border-ink/20 bg-paper-raised px-3 py-2 text-ink shadow-sm placeholder:text-ink-faint " +
  "focus:border-cell-500 focus:outline-none focus:ring-2 focus:ring-cell-500/30 aria-[invalid=true]:border-warn " +
  "dark:border-night-line dark:bg-night-sunk dark:text-paper dark:placeholder:text-paper/40";

export function Field(props: {
  id: string;
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  children: ReactNode;
  className?: string;
}) {
  return (
    <div className={`space-y-1 ${props.className ?? ""}`}>
      <label htmlFor={props.id} className="block text-sm font-medium">
        {props.label}
      </label>
      {props.children}
      {props.hint && !props.error ? (
        <p id={`${props.id}-hint`} className="muted text-xs">
          {props.hint}
        </p>
      ) : null}
      {props.error ? (
        <p id={`${props.id}-error`} className="text-sm text-warn dark:text-red-300" role="alert">
          {props.error}
        </p>
      ) : null}
    </div>
  );
}

/** aria attributes tying an input to its hint or error. */
export function describedBy(
  id: string,
  error?: string,
  hint?: boolean,
): { "aria-invalid": boolean; "aria-describedby"?: string } {
  if (error) return { "aria-invalid": true, "aria-describedby": `${id}-error` };
  return hint ? { "aria-invalid": false, "aria-describedby": `${id}-hint` } : { "aria-invalid": false };
}

const alertTones = {
  error: "border-warn/40 bg-warn-soft text-warn dark:border-red-400/40 dark:bg-red-950/40 dark:text-red-200",
  success: "border-cell-500/40 bg-cell-50 text-cell-700 dark:border-cell-400/40 dark:bg-cell-700/20 dark:text-cell-100",
  info: "border-charge-400/50 bg-charge-50 text-charge-700 dark:border-charge-400/40 dark:bg-charge-700/20 dark:text-charge-100",
} as const;

/** The look of an Alert, for a message placed inside a live region that is already on the page. */
export function alertClass(tone: keyof typeof alertTones): string {
  return `rounded-md border px-3 py-2 text-sm ${alertTones[tone]}`;
}

export function Alert({ tone, children }: { tone: keyof typeof alertTones; children: ReactNode }) {
  return (
    <div role={tone === "error" ? "alert" : "status"} className={alertClass(tone)}>
      {children}
    </div>
  );
}

const buttonTones = {
  primary: "bg-charge-500 text-night hover:bg-charge-400",
  secondary:
    "border border-ink/20 bg-paper-raised text-ink hover:bg-paper-sunk dark:border-night-line dark:bg-night-raised dark:text-paper dark:hover:bg-night-sunk",
  danger:
    "border border-warn/40 bg-paper-raised text-warn hover:bg-warn-soft dark:border-red-400/40 dark:bg-night-raised dark:text-red-300 dark:hover:bg-red-950/40",
} as const;

export function buttonClass(tone: keyof typeof buttonTones = "primary", extra = ""): string {
  return `inline-flex items-center justify-center gap-1 rounded-md px-3 py-1.5 text-sm font-medium no-underline hover:no-underline disabled:cursor-not-allowed disabled:opacity-60 ${buttonTones[tone]} ${extra}`;
}
