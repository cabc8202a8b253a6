import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { z } from "zod";
import { recordId } from "@/lib/validations/ids";
import { Alert } from "@/components/ui/form";
import { listBenchProfilesForUser } from "@/db/queries/bench-profiles";
import { getLatestChangeRequest, getResultForEdit } from "@/db/queries/submissions";
import { env } from "@/server/env";
import { labelSpec } from "@/lib/format";
import { requirePageUser } from "@/server/page-auth";
import { reviewStatusLabels } from "@/lib/review-status-labels";
import { profileOption } from "../_components/profile-option";
import { ResubmitForm } from "./_components/resubmit-form-client";

export const metadata: Metadata = { title: "Answer a change request" };
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
  const [request, profiles] = await Promise.all([getLatestChangeRequest(resultId), listBenchProfilesForUser(user.id)]);
  const p = result.pack;
  const e = env();
  return (
    <div className="space-y-6">
      <header className="max-w-3xl space-y-2">
        <h1>Answer a change request</h1>
        <p className="muted num">
          {p.makerName} {p.model} · {labelSpec(p)} · result #{result.id}
        </p>
      </header>
      {result.status !== "changes_requested" ? (
        <Alert tone="info">
          This result is {reviewStatusLabels[result.status].toLowerCase()}; only a result with changes requested can be
          edited and resubmitted. <Link href="/account">Back to your account</Link>
        </Alert>
      ) : (
        <>
          <Alert tone="info">
            A moderator asked for a change{request?.reason ? `: “${request.reason}”` : "."} Edit what needs changing,
            upload a corrected log if needed, and say what you changed. Every step stays in the result’s history.
          </Alert>
          <ResubmitForm
            result={result}
            profiles={profiles.map(profileOption)}
            limits={{
              logMaxMb: Math.round(e.LOG_MAX_BYTES / (1024 * 1024)),
              photoMaxMb: Math.round(e.PHOTO_MAX_BYTES / (1024 * 1024)),
            }}
          />
        </>
      )}
    </div>
  );
}
