import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { z } from "zod";
import { recordId } from "@/lib/validations/ids";
import { ModeratorRequest } from "@/components/moderator-request";
import { Alert } from "@/components/ui/form";
import { listBenchProfilesForUser } from "@/db/queries/bench-profiles";
import { getLatestRequest, getResultForEdit } from "@/db/queries/submissions";
import { env } from "@/server/env";
import { labelSpec } from "@/lib/format";
import { requirePageUser } from "@/server/page-auth";
import { ownStatusLabels } from "@/lib/labels";
import { profileOption } from "../_components/profile-option";
import { ResubmitForm } from "./_components/resubmit-form-client";

export const metadata: Metadata = { title: "Answer the moderator" };
export const dynamic = "force-dynamic";

const params = z.object({ resultId: recordId });

export default async function ResubmitPage(props: { params: Promise<{ resultId: string }> }) {
  const parsed = params.safeParse(await props.params);
  if (!parsed.success) notFound();
  const { resultId } = parsed.data;
  const user = await requirePageUser("result.resubmit-own", `/submit/${resultId}`);
  const result = await getResultForEdit(resultId);
  // Someone else's result is "not found" here, exactly like a missing one: the page does not confirm it exists.
  if (!result || result.contributorId !== user.id) notFound();
  const [request, profiles] = await Promise.all([getLatestRequest(resultId), listBenchProfilesForUser(user.id)]);
  const p = result.pack;
  const e = env();
  return (
    <div className="space-y-6">
      <header className="max-w-3xl space-y-2">
        <h1>Answer the moderator</h1>
        <p className="muted num">
          Result #{result.id} · {p.makerName} {p.model} · {labelSpec(p)} ·{" "}
          <Link href={`/account/results/${result.id}`}>your view of it</Link>
        </p>
      </header>
      {result.status !== "awaiting_answer" ? (
        <Alert tone="info">
          This result is “{ownStatusLabels[result.status].toLowerCase()}”; only a result waiting for your answer can be
          edited and sent back. <Link href={`/account/results/${result.id}`}>See where it is</Link>
        </Alert>
      ) : (
        <div className="grid gap-6 lg:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
          <aside className="min-w-0 space-y-3 lg:order-2">
            <div className="space-y-3 lg:sticky lg:top-4">
              {request ? <ModeratorRequest request={request} /> : null}
              <p className="muted text-sm">
                Edit what the request is about, upload a corrected log if needed, and say what you changed. Every step
                stays in the result’s history.
              </p>
            </div>
          </aside>
          <div className="min-w-0 lg:order-1">
            <ResubmitForm
              result={result}
              profiles={profiles.map(profileOption)}
              limits={{
                logMaxMb: Math.round(e.LOG_MAX_BYTES / (1024 * 1024)),
                photoMaxMb: Math.round(e.PHOTO_MAX_BYTES / (1024 * 1024)),
              }}
            />
          </div>
        </div>
      )}
    </div>
  );
}
