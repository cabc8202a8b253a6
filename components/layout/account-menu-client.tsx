"use client";
// The header's account slot. Public pages are static, so who is signed in is asked from /api/v1/me in
// the browser (again after each navigation, so signing in or out shows at once).
import Link from "next/link";
import { usePathname } from "next/navigation";
import { useEffect, useState } from "react";
import { z } from "zod";

const meSchema = z.object({
  user: z.object({ name: z.string(), role: z.enum(["contributor", "moderator", "admin"]) }).nullable(),
});
type Me = z.infer<typeof meSchema>["user"];

const linkClass =
  "whitespace-nowrap rounded px-2 py-1 text-ink-soft no-underline hover:bg-paper-sunk hover:text-ink hover:no-underline dark:text-paper/75 dark:hover:bg-night-sunk dark:hover:text-paper";

export function AccountMenu() {
  const pathname = usePathname();
  const [me, setMe] = useState<Me | undefined>(undefined);

  useEffect(() => {
    let live = true;
    fetch("/api/v1/me", { cache: "no-store", credentials: "same-origin" })
      .then(async (r) => (r.ok ? meSchema.parse(await r.json()).user : null))
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
      <Link href={`/sign-in${back}`} className={linkClass} data-testid="account-menu">
        Sign in
      </Link>
    );
  }
  return (
    <span className="flex items-center gap-1" data-testid="account-menu">
      {me.role === "moderator" || me.role === "admin" ? (
        <Link href="/review" className={linkClass}>
          Review
        </Link>
      ) : null}
      {me.role === "admin" ? (
        <Link href="/admin/users" className={linkClass}>
          Admin
        </Link>
      ) : null}
      <Link href="/account" className={linkClass} title={`Signed in as ${me.name}`}>
        <span className="hidden max-w-[12rem] truncate align-bottom md:inline-block">{me.name}</span>
        <span className="hidden md:inline" aria-hidden="true">
          {" "}
          ·{" "}
        </span>
        Account
      </Link>
    </span>
  );
}
