import type { Metadata } from "next";
import Link from "next/link";
import { listUsers } from "@/db/queries/users";
import { requirePageUser } from "@/server/page-auth";
import { userListParams } from "@/lib/validations/user-role";
import { RoleForm } from "./_components/role-form-client";

export const metadata: Metadata = { title: "Users and roles" };
export const dynamic = "force-dynamic";

const PAGE_SIZE = 50;
const joined = (d: Date) =>
  d.toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });

export default async function AdminUsersPage(props: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const me = await requirePageUser("user.set-role", "/admin/users");
  const { page } = userListParams.parse(await props.searchParams);
  const { rows, total } = await listUsers(PAGE_SIZE, (page - 1) * PAGE_SIZE);
  const pages = Math.max(1, Math.ceil(total / PAGE_SIZE));
  return (
    <div className="space-y-6">
      <div className="space-y-1">
        <h1>Users and roles</h1>
        <p className="muted max-w-3xl">
          Contributors submit results and keep bench profiles; moderators also work the review queue; admins also manage
          roles and the catalogue. A change takes effect on the person’s next click. There is always at least one admin.
        </p>
      </div>
      <ul
        className="divide-y divide-ink/10 rounded-lg border border-ink/10 bg-paper-raised dark:divide-night-line dark:border-night-line dark:bg-night-raised"
        data-testid="user-list"
      >
        {rows.map((u) => (
          <li
            key={u.id}
            className="flex flex-wrap items-center justify-between gap-x-6 gap-y-2 px-4 py-3"
            data-testid="user-row"
            data-email={u.email ?? ""}
          >
            <div className="min-w-0 space-y-0.5">
              <p className="truncate font-medium">
                {u.email ?? "(no address)"}
                {u.id === me.id ? <span className="muted text-sm font-normal"> (you)</span> : null}
              </p>
              <p className="muted text-sm">
                {u.displayName ?? "No display name"}
                {u.anonymous ? " · anonymous" : ""} · joined {joined(u.createdAt)}
              </p>
            </div>
            <RoleForm userId={u.id} email={u.email ?? u.id} role={u.role} />
          </li>
        ))}
      </ul>
      {pages > 1 ? (
        <nav aria-label="Pages" className="flex items-center gap-4 text-sm">
          {page > 1 ? <Link href={`/admin/users?page=${page - 1}`}>← Previous</Link> : null}
          <span className="muted">
            Page {page} of {pages}
          </span>
          {page < pages ? <Link href={`/admin/users?page=${page + 1}`}>Next →</Link> : null}
        </nav>
      ) : null}
    </div>
  );
}
