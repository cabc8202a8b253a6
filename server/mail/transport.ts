// The SMTP transport, from env().SMTP_URL (a URL string: the object form trips over empty credentials).
import "server-only";
import nodemailer, { type Transporter } from "nodemailer";
import { env } from "@/server/env";

export type MailTransport = Pick<Transporter, "sendMail">;

const cache = new Map<string, Transporter>();

/** One pooled-by-URL transport with short timeouts, so a dead relay fails fast and the outbox retries. */
export function mailTransport(url: string = env().SMTP_URL): Transporter {
  let t = cache.get(url);
  if (!t) {
    t = nodemailer.createTransport({ url, connectionTimeout: 10_000, greetingTimeout: 10_000, socketTimeout: 20_000 });
    cache.set(url, t);
  }
  return t;
}
