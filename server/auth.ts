// Auth.js: e-mail link sign-in (Nodemailer provider, our own mail through the outbox), database sessions
// through the Drizzle adapter. No passwords. The lazy config form means nothing touches the database or
// the environment until a request needs it (builds and type checks stay offline).
import "server-only";
import { DrizzleAdapter } from "@auth/drizzle-adapter";
import NextAuth from "next-auth";
import Nodemailer from "next-auth/providers/nodemailer";
import { getDb } from "@/db";
import { accounts, sessions, users, verificationTokens } from "@/db/schema";
import { env } from "@/server/env";
import { queueMail } from "@/server/mail/outbox";
import { signInLinkMail } from "@/server/mail/templates";
import { parseSignInEmail } from "@/lib/validations/sign-in";

const SIGN_IN_LINK_MAX_AGE_S = 24 * 60 * 60;
const SESSION_MAX_AGE_S = 30 * 24 * 60 * 60;

export const { handlers, signIn, signOut } = NextAuth(() => ({
  // getDb(), not the lazy `db` proxy: the adapter recognises the client with an instanceof check.
  adapter: DrizzleAdapter(getDb(), {
    usersTable: users,
    accountsTable: accounts,
    sessionsTable: sessions,
    verificationTokensTable: verificationTokens,
  }),
  session: { strategy: "database", maxAge: SESSION_MAX_AGE_S, updateAge: 24 * 60 * 60 },
  providers: [
    Nodemailer({
      server: env().SMTP_URL, // a URL string (STACK.md gotcha 2)
      from: env().MAIL_FROM,
      maxAge: SIGN_IN_LINK_MAX_AGE_S,
      // The same one-address rule as the sign-in form and the route (lib/validations/sign-in.ts): a list or
      // a display-name form throws here, so Auth.js sends nothing.
      normalizeIdentifier: parseSignInEmail,
      // Queued in the outbox, never sent inside the request: the mail worker, woken by the insert, sends it at
      // once and retries it if the relay is down; its body is wiped once sent (Auth.js stores the token hashed).
      async sendVerificationRequest({ identifier, url, expires }) {
        await queueMail(identifier, signInLinkMail({ url, expires }), { sensitive: true });
      },
    }),
  ],
  // Our own pages; GET /api/auth/signout goes to the account page, whose button signs out. A first sign-in
  // lands on the choice of public name (with the callbackUrl to go on to).
  pages: {
    signIn: "/sign-in",
    verifyRequest: "/sign-in/check-email",
    error: "/sign-in",
    signOut: "/account",
    newUser: "/account/public-name",
  },
  trustHost: true, // STACK.md gotchas 4–5: opened at http://localhost:PORT, behind our own host header
  secret: env().AUTH_SECRET,
  // One line per problem in the server log (expired links, missing CSRF tokens are routine), no stacks.
  logger: {
    error: (error) => {
      // AuthError subclasses carry a stable `type` ("Verification", "MissingCSRF"…); class names are minified.
      const type = "type" in error && typeof error.type === "string" ? error.type : error.name;
      const detail = error.message.split("\n")[0]?.replace(/\s*Read more at \S+/, "");
      console.error(`[auth] ${type}${detail ? `: ${detail}` : ""}`);
    },
    warn: (code) => console.warn(`[auth] warning: ${code}`),
  },
  callbacks: {
    // Only our own pages as destinations after sign-in or sign-out.
    redirect({ url, baseUrl }) {
      if (url.startsWith("/") && !url.startsWith("//")) return `${baseUrl}${url}`;
      try {
        if (new URL(url).origin === baseUrl) return url;
      } catch {
        // fall through
      }
      return baseUrl;
    },
  },
}));
