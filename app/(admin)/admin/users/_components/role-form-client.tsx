"use client";
import { useActionState } from "react";
import { buttonClass, inputClass } from "@/components/ui/form";
import { userRoles, type UserRole } from "@/lib/enums";
import { setUserRole } from "../actions/set-user-role";

const roleLabels: Record<UserRole, string> = { contributor: "Contributor", moderator: "Moderator", admin: "Admin" };

export function RoleForm({ userId, email, role }: { userId: string; email: string; role: UserRole }) {
  const [state, formAction, pending] = useActionState(setUserRole, null);
  const selectId = `role-${userId}`;
  return (
    <form action={formAction} className="flex flex-col items-start gap-1 sm:items-end">
      <input type="hidden" name="userId" value={userId} />
      <div className="flex items-center gap-2">
        <label htmlFor={selectId} className="sr-only">
          Role for {email}
        </label>
        <select
          id={selectId}
          name="role"
          defaultValue={state?.ok ? state.data.to : role}
          className={`${inputClass} w-auto py-1.5`}
        >
          {userRoles.map((r) => (
            <option key={r} value={r}>
              {roleLabels[r]}
            </option>
          ))}
        </select>
        <button type="submit" className={buttonClass("secondary", "whitespace-nowrap")} disabled={pending}>
          {pending ? "Saving…" : "Change role"}
        </button>
      </div>
      <p aria-live="polite" className="text-sm">
        {state && !state.ok ? <span className="text-warn dark:text-red-300">{state.error}</span> : null}
        {state?.ok ? (
          <span className="text-cell-600 dark:text-cell-400">
            {state.data.changed ? `Now ${roleLabels[state.data.to].toLowerCase()}.` : "No change."}
          </span>
        ) : null}
      </p>
    </form>
  );
}
