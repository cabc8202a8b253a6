// The one permission table: resource.action → roles allowed. Every server action and route handler that
// changes state names one of these; hiding a button is never the check.
import type { UserRole } from "@/lib/enums";

const everyone: readonly UserRole[] = ["contributor", "moderator", "admin"];
const moderators: readonly UserRole[] = ["moderator", "admin"];
const admins: readonly UserRole[] = ["admin"];

const permissions = {
  "account.update": everyone,
  "bench-profile.manage": everyone,
  "result.submit": everyone,
  "result.withdraw-own": everyone,
  "result.resubmit-own": everyone,
  "upload.create": everyone,
  "pack-emails.manage": everyone,
  "chart.save": everyone,
  "result.flag": everyone,
  "result.review": moderators,
  "review-queue.read": moderators,
  "result.evidence": moderators,
  "flag.resolve": moderators,
  "chart.feature": moderators,
  "catalogue.edit": admins,
  "catalogue.merge": admins,
  "user.set-role": admins,
  "settings.edit": admins,
  "mail.retry": admins,
} as const satisfies Record<string, readonly UserRole[]>;

export type Permission = keyof typeof permissions;

export function can(role: UserRole | null | undefined, permission: Permission): boolean {
  return !!role && (permissions[permission] as readonly UserRole[]).includes(role);
}
