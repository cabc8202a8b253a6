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

/**
 * The one rule for the address a sign-in link goes to, on every path into Auth.js (the sign-in action, a
 * raw POST to /api/auth/signin/nodemailer, and Auth.js's own normalizeIdentifier): one address, after the
 * same normalisation Auth.js applies — no list ("a@x.test, b@x.test"), no display-name form
 * ("Name <a@x.test>"), nothing a mail library could split into several recipients.
 */
export const signInEmail = z
  .string({ error: "Enter your e-mail address." })
  .transform(normaliseEmail)
  .pipe(
    z
      .string()
      .min(1, "Enter your e-mail address.")
      .max(254, "That address is too long.")
      .refine((v) => v.split("@").length <= 2, { message: "Enter one e-mail address only.", abort: true })
      // Separators without a second "@" are not a list, just not an address.
      .refine((v) => !/[,;\s]/.test(v), { message: "Enter an e-mail address like name@example.com.", abort: true })
      .refine((v) => !/[<>"()]/.test(v), {
        message: "Enter the address alone, like name@example.com, without a name.",
        abort: true,
      })
      .pipe(z.email({ error: "Enter an e-mail address like name@example.com." })),
  );

/** The rule as a function for Auth.js's normalizeIdentifier: the normalised address, or a thrown ZodError. */
export function parseSignInEmail(value: unknown): string {
  return signInEmail.parse(value);
}

export const signInSchema = z.object({
  email: signInEmail,
  callbackUrl: callbackPath.optional().transform((v) => v ?? "/account"),
});
