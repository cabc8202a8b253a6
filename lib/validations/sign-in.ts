// The sign-in form: one e-mail address, and where to go afterwards (our own paths only).
import { z } from "zod";

/** The same normalisation Auth.js applies to the identifier, so rate-limit keys and user rows agree. */
export function normaliseEmail(email: string): string {
  return email.normalize("NFKC").trim().toLowerCase();
}

/** A path on this site ("/account/…"); anything else (other hosts, "//evil") falls back to /account. */
export const callbackPath = z
  .string()
  .max(500)
  .refine((v) => /^\/(?![/\\])[\x21-\x7e]*$/.test(v), "Not a path on this site")
  .catch("/account");

export const signInSchema = z.object({
  email: z
    .string({ error: "Enter your e-mail address." })
    .transform(normaliseEmail)
    .pipe(
      z
        .string()
        .min(1, "Enter your e-mail address.")
        .max(254, "That address is too long.")
        .pipe(z.email({ error: "Enter an e-mail address like name@example.com." })),
    ),
  callbackUrl: callbackPath.optional().transform((v) => v ?? "/account"),
});
