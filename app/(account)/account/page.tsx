import type { Metadata } from "next";
import Link from "next/link";
import { buttonClass } from "@/components/ui/form";
import { listBenchProfilesForUser } from "@/db/queries/bench-profiles";
import { listResultsByContributor } from "@/db/queries/results-by-contributor";
import { listPackEmailsForUser } from "@/db/queries/pack-emails";
import { resistanceMethodLabels, roleLabels } from "@/lib/labels";
import { UNNAMED_CONTRIBUTOR } from "@/lib/user-name";
import { requirePageUser } from "@/server/page-auth";
import { signOut } from "./actions/sign-out";
import { MyResults } from "./_components/my-results";
import { ProfileForm } from "./_components/profile-form-client";
import { PackEmailsList } from "./_components/pack-emails-list-client";

export const metadata: Metadata = { title: "Your account" };
export const dynamic = "force-dynamic";

export default async function AccountPage() {
  const user = await requirePageUser("account.update", "/account");
  const [results, profiles, emailPacks] = await Promise.all([
    listResultsByContributor(user.id),
    listBenchProfilesForUser(user.id),
    listPackEmailsForUser(user.id),
  ]);
  return (
    <div className="space-y-10">
      <header className="flex flex-wrap items-end justify-between gap-4">
        <div className="space-y-1">
          <h1>Your account</h1>
          <p className="muted text-sm">
            Signed in as <span className="font-medium text-ink dark:text-paper">{user.email}</span> · role{" "}
            {roleLabels[user.role].toLowerCase()}
          </p>
        </div>
        <form action={signOut}>
          <button type="submit" className={buttonClass("secondary")}>
            Sign out
          </button>
        </form>
      </header>

      <section aria-labelledby="profile-heading" className="space-y-3">
        <h2 id="profile-heading">Your public name</h2>
        {!user.publicNameChosen ? (
          <p className="text-sm" data-testid="name-not-chosen">
            You have not chosen yet: until you do, your published results say “{UNNAMED_CONTRIBUTOR}”.
          </p>
        ) : null}
        <div className="card max-w-xl">
          <ProfileForm
            initial={{ displayName: user.displayName ?? "", anonymous: user.anonymous, chosen: user.publicNameChosen }}
          />
        </div>
      </section>

      <section aria-labelledby="results-heading" className="space-y-3">
        <h2 id="results-heading">Your results</h2>
        <MyResults results={results} />
      </section>

      <section aria-labelledby="profiles-heading" className="space-y-3">
        <div className="flex flex-wrap items-center justify-between gap-2">
          <h2 id="profiles-heading">Bench profiles</h2>
          <Link href="/account/bench-profiles/new" className={buttonClass("secondary")}>
            New bench profile
          </Link>
        </div>
        {profiles.length === 0 ? (
          <p className="muted">
            No bench profiles yet. A bench profile keeps your equipment and usual method-card values, so each submission
            starts filled in.
          </p>
        ) : (
          <ul className="grid gap-2 sm:grid-cols-2" data-testid="account-bench-profiles">
            {profiles.map((p) => (
              <li key={p.id} className="card">
                <Link href={`/account/bench-profiles/${p.id}/edit`} className="font-medium">
                  {p.name}
                </Link>
                <p className="muted text-sm">
                  {p.loadEquipment} · {resistanceMethodLabels[p.resistanceMethod]}
                </p>
              </li>
            ))}
          </ul>
        )}
      </section>

      <section aria-labelledby="pack-emails-heading" className="space-y-3">
        <h2 id="pack-emails-heading">E-mails about new results</h2>
        <PackEmailsList
          packs={emailPacks.map((w) => ({ packId: w.packId, slug: w.slug, title: `${w.makerName} ${w.model}` }))}
        />
      </section>
    </div>
  );
}
