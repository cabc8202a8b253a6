"use client";
import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { buttonClass } from "@/components/ui/form";
import { deleteBenchProfile } from "../actions/delete-bench-profile";

export function DeleteBenchProfileButton({ id, name }: { id: number; name: string }) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [error, setError] = useState<string | null>(null);
  const onClick = () => {
    if (!window.confirm(`Delete the bench profile “${name}”? Results you submitted with it keep their method card.`))
      return;
    startTransition(async () => {
      const res = await deleteBenchProfile(null, { id });
      if (res.ok) router.refresh();
      else setError(res.error);
    });
  };
  return (
    <>
      <button type="button" className={buttonClass("danger")} onClick={onClick} disabled={pending}>
        {pending ? "Deleting…" : "Delete"}
      </button>
      {error ? (
        <span role="alert" className="self-center text-sm text-warn dark:text-red-300">
          {error}
        </span>
      ) : null}
    </>
  );
}
