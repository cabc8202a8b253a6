"use server";
// Public: anyone may ask for a sign-in link. One address (the shared rule of lib/validations/sign-in.ts,
// checked before the limits), limited per e-mail address and per client address; the link goes out through
// Auth.js (which creates the hashed verification token) and our mail outbox.
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { signIn } from "@/server/auth";
import { actionError, AppError, type ActionResult } from "@/lib/errors";
import { clientAddress } from "@/server/client-address";
import { enforceSignInLimits } from "@/server/sign-in-limits";
import { signInSchema } from "@/lib/validations/sign-in";

export async function requestSignInLink(_prev: ActionResult | null, form: FormData): Promise<ActionResult> {
  let next: string;
  try {
    // Only the sign-in form calls this; a hand-made request may send anything instead of its fields.
    if (!(form instanceof FormData)) throw new AppError("bad_request", "Send the sign-in form.");
    const input = signInSchema.parse({
      email: form.get("email") ?? "",
      callbackUrl: form.get("callbackUrl") ?? undefined,
    });
    await enforceSignInLimits(input.email, clientAddress(await headers()));
    next = await signIn("nodemailer", { email: input.email, redirectTo: input.callbackUrl, redirect: false });
    if (new URL(next, "http://x").searchParams.has("error")) {
      throw new AppError("unavailable", "We could not send a sign-in link just now. Please try again in a moment.");
    }
  } catch (err) {
    return actionError(err);
  }
  redirect("/sign-in/check-email");
}
