"use client";
// Watch / unwatch a pack (an e-mail when a new result on it is published). Signed-out visitors are sent
// to sign in and brought back. The server action checks the session; this button only reflects state.
import { usePathname, useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { unwatchPack } from "@/app/actions/unwatch-pack";
import { watchPack } from "@/app/actions/watch-pack";
import { buttonClass } from "@/components/ui/form";

export function WatchButton({ packId, initialWatching }: { packId: number; initialWatching: boolean }) {
  const router = useRouter();
  const pathname = usePathname();
  const [watching, setWatching] = useState(initialWatching);
  const [error, setError] = useState<string | null>(null);
  const [pending, startTransition] = useTransition();

  const toggle = () =>
    startTransition(async () => {
      const res = watching ? await unwatchPack(null, { packId }) : await watchPack(null, { packId });
      if (res.ok) {
        setWatching(res.data.watching);
        setError(null);
      } else if (res.code === "unauthenticated") {
        router.push(`/sign-in?${new URLSearchParams({ callbackUrl: pathname })}`);
      } else setError(res.error);
    });

  return (
    <span className="inline-flex flex-col gap-1">
      <button
        type="button"
        onClick={toggle}
        disabled={pending}
        aria-pressed={watching}
        className={buttonClass(watching ? "secondary" : "primary")}
      >
        {watching ? "Watching ✓ — stop" : "Watch this pack"}
      </button>
      {error ? (
        <span role="alert" className="text-sm text-warn dark:text-red-300">
          {error}
        </span>
      ) : null}
    </span>
  );
}
