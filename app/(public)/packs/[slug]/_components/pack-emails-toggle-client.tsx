"use client";
// "E-mail me new results for this pack", and back off again. Signed-out visitors are sent to sign in and
// brought back. The server action checks the session; this button only reflects state.
import { usePathname, useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { startPackEmails } from "@/app/actions/start-pack-emails";
import { stopPackEmails } from "@/app/actions/stop-pack-emails";
import { buttonClass } from "@/components/ui/form";

const PACK_EMAILS_OFF = "E-mail me new results for this pack";
const PACK_EMAILS_ON = "E-mails on: new results for this pack · stop";

export function PackEmailsToggle({ packId, initialOn }: { packId: number; initialOn: boolean }) {
  const router = useRouter();
  const pathname = usePathname();
  const [on, setOn] = useState(initialOn);
  const [error, setError] = useState<string | null>(null);
  const [pending, startTransition] = useTransition();

  const toggle = () =>
    startTransition(async () => {
      const res = on ? await stopPackEmails(null, { packId }) : await startPackEmails(null, { packId });
      if (res.ok) {
        setOn(res.data.emails);
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
        aria-pressed={on}
        className={buttonClass(on ? "secondary" : "primary")}
      >
        {on ? PACK_EMAILS_ON : PACK_EMAILS_OFF}
      </button>
      {error ? (
        <span role="alert" className="text-sm text-warn dark:text-red-300">
          {error}
        </span>
      ) : null}
    </span>
  );
}
