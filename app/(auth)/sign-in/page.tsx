import type { Metadata } from "next";
import { z } from "zod";
import Link from "next/link";
import { Alert } from "@/components/ui/form";
import { getCurrentUser } from "@/server/session";
import { publicName } from "@/lib/user-name";
import { callbackPath } from "@/lib/validations/sign-in";
import { SignInForm } from "./sign-in-client";

export const metadata: Metadata = { title: "Sign in" };

const params = z.object({
  callbackUrl: callbackPath.optional(),
  error: z.string().max(40).optional().catch(undefined),
});

// Auth.js sends people back here with ?error=… when a link is used twice, has expired, or sending failed.
const errorText: Record<string, string> = {
  Verification: "That sign-in link has expired or was already used. Ask for a new one below.",
  EmailSignin: "We could not send a sign-in link just now. Please try again in a moment.",
  AccessDenied: "Signing in with that address is not allowed.",
};

export default async function SignInPage(props: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const sp = params.parse(await props.searchParams);
  const error = sp.error
    ? (errorText[sp.error] ?? "Something went wrong while signing in. Please ask for a new link.")
    : null;
  const current = await getCurrentUser();
  return (
    <div className="space-y-6">
      <div className="space-y-2">
        <h1>Sign in</h1>
        <p className="muted">
          Enter your e-mail address and we will send you a link that signs you in. There is no password. New here? The
          same link creates your contributor account.
        </p>
      </div>
      {error ? <Alert tone="error">{error}</Alert> : null}
      {current ? (
        <Alert tone="info">
          You are already signed in as {publicName(current)}. <Link href={sp.callbackUrl ?? "/account"}>Continue</Link>,
          or ask for a link for another address below.
        </Alert>
      ) : null}
      <div className="card">
        <SignInForm callbackUrl={sp.callbackUrl ?? "/account"} />
      </div>
      <p className="muted text-sm">
        Reading, comparing and downloading need no account. You sign in to submit results, keep bench profiles and be
        e-mailed new results for the packs you choose.
      </p>
    </div>
  );
}
