// Sign-in link requests are limited per address and per IP (DB-backed, shared by every app instance).
// Used by the sign-in form's action and by the Auth.js route for direct POSTs.
import "server-only";
import { AppError } from "@/lib/errors";
import { env } from "@/server/env";
import { enforceRateLimit, limits } from "@/server/rate-limit";
import { normaliseEmail } from "@/lib/validations/sign-in";

function minutes(s: number | undefined): string {
  const m = Math.max(1, Math.ceil((s ?? 60) / 60));
  return m === 1 ? "a minute" : `${m} minutes`;
}

export async function enforceSignInLimits(email: string, ip: string): Promise<void> {
  try {
    await enforceRateLimit(`sign-in:ip:${ip}`, { ...limits.signInPerIp, limit: env().SIGN_IN_PER_ADDRESS });
    await enforceRateLimit(`sign-in:email:${normaliseEmail(email)}`, limits.signInPerEmail);
  } catch (err) {
    if (err instanceof AppError && err.code === "rate_limited") {
      throw new AppError(
        "rate_limited",
        `Too many sign-in links were requested. Please wait ${minutes(err.retryAfterS)} and try again, or use the newest link we sent.`,
        undefined,
        err.retryAfterS,
      );
    }
    throw err;
  }
}
