"use client";
// The header's account slot. Public pages are static, so who is signed in is asked from /api/v1/me in
// the browser (again after each navigation, so signing in or out shows at once).
import { usePathname } from "next/navigation";
import { useEffect, useState } from "react";

type Me = { name: string; role: "contributor" | "moderator" | "admin" } | null;
const ROLES = ["contributor", "moderator", "admin"] as const;

/** The /api/v1/me answer, checked by hand: zod would add ≈ 30 KB (gzip) to every page's script. */
function readMe(body: unknown): Me {
  if (typeof body !== "object" || body === null || !("user" in body)) throw new Error("unexpected /api/v1/me answer");
  const user: unknown = body.user;
  if (user === null) return null;
  if (typeof user !== "object" || !("name" in user) || !("role" in user)) throw new Error("unexpected user");
  const { name, role } = user;
  const known = ROLES.find((r) => r === role);
  if (typeof name !== "string" || !known) throw new Error("unexpected user");
  return { name, role: known };
}

const linkClass =
  "whitespace-nowrap rounded px-2 py-1 text-ink-soft no-underline hover:bg-paper-sunk hover:text-ink hover:no-underline dark:text-paper/75 dark:hover:bg-night-sunk dark:hover:text-paper";

export function AccountMenu() {
  const pathname = usePathname();
  const [me, setMe] = useState<Me | undefined>(undefined);

  useEffect(() => {
    let live = true;
    fetch("/api/v1/me", { cache: "no-store", credentials: "same-origin" })
      .then(async (r) => (r.ok ? readMe(await r.json()) : null))
      .catch(() => null)
      .then((user) => {
        if (live) setMe(user);
      });
    return () => {
      live = false;
    };
  }, [pathname]);

  if (me === undefined) return <span className="inline-block w-16" aria-hidden="true" />;
  if (me === null) {
    const back =
      pathname && !pathname.startsWith("/sign-in") && pathname !== "/"
        ? `?${new URLSearchParams({ callbackUrl: pathname })}`
        : "";
    return (
      <a href={`/sign-in${back}`} className={linkClass} data-testid="account-menu">
        Sign in
      </a>
    );
  }
  return (
    <span className="flex items-center gap-1" data-testid="account-menu">
      {me.role === "moderator" || me.role === "admin" ? (
        <a href="/review" className={linkClass}>
          Review
        </a>
      ) : null}
      {me.role === "admin" ? (
        <a href="/admin/users" className={linkClass}>
          Admin
        </a>
      ) : null}
      <a href="/account" className={linkClass} title={`Signed in as ${me.name}`}>
        <span className="hidden max-w-[12rem] truncate align-bottom md:inline-block">{me.name}</span>
        <span className="hidden md:inline" aria-hidden="true">
          {" "}
          ·{" "}
        </span>
        Account
      </a>
    </span>
  );
}
