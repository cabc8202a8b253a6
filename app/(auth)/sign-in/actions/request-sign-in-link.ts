"use server";
// Public: anyone may ask for a sign-in link. Limited per address and per IP; the link goes out through
// Auth.js (which creates the hashed verification token) and our mail outbox.
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { signIn } from "@/server/auth";
import { actionError, AppError, type ActionResult } from "@/lib/errors";
import { clientIp } from "@/server/rate-limit";
import { enforceSignInLimits } from "@/server/sign-in-limits";
import { signInSchema } from "@/lib/validations/sign-in";

export async function requestSignInLink(_prev: ActionResult | null, form: FormData): Promise<ActionResult> {
  let next: string;
  try {
    const input = signInSchema.parse({
      email: form.get("email") ?? "",
      callbackUrl: form.get("callbackUrl") ?? undefined,
    });
    await enforceSignInLimits(input.email, clientIp(await headers()));
    next = await signIn("nodemailer", { email: input.email, redirectTo: input.callbackUrl, redirect: false });
    if (new URL(next, "http://x").searchParams.has("error")) {
      throw new AppError("unavailable", "We could not send a sign-in link just now. Please try again in a moment.");
    }
  } catch (err) {
    return actionError(err);
  }
  redirect("/sign-in/check-email");
}
