import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { listBenchProfilesForUser } from "@/db/queries/bench-profiles";
import { getSiteSettings } from "@/db/queries/site-settings";
import { listMakerChoices, listPackChoices } from "@/db/queries/submissions";
import { Alert } from "@/components/ui/form";
import { env } from "@/server/env";
import { requirePageUser } from "@/server/page-auth";
import { SubmitForm } from "./_components/submit-form-client";
import { profileOption } from "./_components/profile-option";

export const metadata: Metadata = { title: "Submit a result" };
export const dynamic = "force-dynamic";

export default async function SubmitPage() {
  const user = await requirePageUser("result.submit", "/submit");
  // Results carry their contributor's public name: it is chosen before the first submission, never assumed.
  if (!user.publicNameChosen) redirect(`/account/public-name?${new URLSearchParams({ callbackUrl: "/submit" })}`);
  const [packs, makers, profiles, settings] = await Promise.all([
    listPackChoices(user.id),
    listMakerChoices(user.id),
    listBenchProfilesForUser(user.id),
    getSiteSettings(),
  ]);
  const e = env();
  return (
    <div className="space-y-6">
      <header className="max-w-3xl space-y-2">
        <h1>Submit a result</h1>
        <p className="muted">
          One test of one pack: choose the pack, state your method, upload the raw log, and confirm. Sagline computes
          the figures from the log itself; a moderator checks the result before it is published. Your draft is kept in
          this browser until you submit. Want to look first? <Link href="/analyse">Analyse a log</Link> without
          submitting.
        </p>
      </header>
      {settings.submissionsPaused ? (
        <div data-testid="submissions-paused" className="max-w-3xl">
          <Alert tone="info">
            <strong>Submissions are paused:</strong> {settings.pauseReason ?? "please try again later"}. You can still
            prepare your draft; it is kept in this browser, and Submit works again once they reopen.
          </Alert>
        </div>
      ) : null}
      <SubmitForm
        userId={user.id}
        packs={packs}
        makers={makers}
        profiles={profiles.map(profileOption)}
        limits={{
          logMaxMb: Math.round(e.LOG_MAX_BYTES / (1024 * 1024)),
          photoMaxMb: Math.round(e.PHOTO_MAX_BYTES / (1024 * 1024)),
        }}
      />
    </div>
  );
}
