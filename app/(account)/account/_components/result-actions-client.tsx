"use client";
// What a contributor can do with their own result while it waits: withdraw it (waiting for review or for
// their answer), or answer the moderator. The server checks ownership and state again.
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { buttonClass } from "@/components/ui/form";
import type { ReviewStatus } from "@/lib/enums";
import { withdrawResult } from "../actions/withdraw-result";

export function ResultActions({
  resultId,
  status,
  answerLink = true,
}: {
  resultId: number;
  status: ReviewStatus;
  /** Off where the page already offers the answer beside the moderator's request. */
  answerLink?: boolean;
}) {
  const router = useRouter();
  const [confirming, setConfirming] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [pending, startTransition] = useTransition();
  if (status !== "pending" && status !== "awaiting_answer") return null;

  const withdraw = () =>
    startTransition(async () => {
      const res = await withdrawResult(null, { resultId: String(resultId) });
      if (res.ok) {
        setConfirming(false);
        router.refresh();
      } else setError(res.error);
    });

  return (
    <div className="flex flex-wrap items-center gap-2 text-sm">
      {status === "awaiting_answer" && answerLink && (
        <Link href={`/submit/${resultId}`} className={buttonClass("primary")}>
          Answer the moderator
        </Link>
      )}
      {confirming ? (
        <>
          <span>Withdraw this result? It will not be reviewed or published.</span>
          <button type="button" className={buttonClass("danger")} onClick={withdraw} disabled={pending}>
            {pending ? "Withdrawing…" : "Yes, withdraw"}
          </button>
          <button
            type="button"
            className={buttonClass("secondary")}
            onClick={() => setConfirming(false)}
            disabled={pending}
          >
            Keep it
          </button>
        </>
      ) : (
        <button type="button" className={buttonClass("secondary")} onClick={() => setConfirming(true)}>
          Withdraw
        </button>
      )}
      {error && (
        <p role="alert" className="w-full text-warn dark:text-red-300">
          {error}
        </p>
      )}
    </div>
  );
}
