import type { Metadata } from "next";
import { z } from "zod";
import { requirePageUser } from "@/server/page-auth";
import { ProfileForm } from "../_components/profile-form-client";

export const metadata: Metadata = { title: "Your public name" };
export const dynamic = "force-dynamic";

/**
 * Only our own pages as the next step. Auth.js hands over the callbackUrl as a full address; only its path is
 * kept, so the next step is always on this site.
 */
const search = z.object({
  callbackUrl: z
    .string()
    .max(500)
    .transform((v) => {
      try {
        const u = new URL(v, "http://sagline.invalid");
        return `${u.pathname}${u.search}`;
      } catch {
        return undefined;
      }
    })
    .pipe(
      z
        .string()
        .regex(/^\/(?!\/)\S*$/)
        .optional(),
    )
    .optional()
    .catch(undefined),
});

// Where a first sign-in lands (Auth.js pages.newUser), and where /submit sends someone who has not chosen yet:
// how published results name them, chosen explicitly, before going on.
export default async function PublicNamePage(props: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const { callbackUrl } = search.parse(await props.searchParams);
  const next = callbackUrl && callbackUrl !== "/account/public-name" ? callbackUrl : "/account";
  const user = await requirePageUser(
    "account.update",
    `/account/public-name?${new URLSearchParams({ callbackUrl: next })}`,
  );
  return (
    <div className="max-w-xl space-y-4">
      <h1>How should your results name you?</h1>
      <p>
        Every published result says who measured it. Choose a name, or to stay anonymous; you can change it later on
        your account page, and it changes on every result at once.
      </p>
      <div className="card">
        <ProfileForm
          initial={{ displayName: user.displayName ?? "", anonymous: user.anonymous, chosen: user.publicNameChosen }}
          next={next}
        />
      </div>
    </div>
  );
}
