import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { env } from "@/server/env";
import { getCaughtMail, linkify } from "@/server/mail/catcher";

export const metadata: Metadata = { title: "Caught mail", robots: { index: false } };
export const dynamic = "force-dynamic";

export default async function DevMailMessagePage(props: { params: Promise<{ id: string }> }) {
  if (!env().SAGLINE_DEV_TOOLS) notFound();
  const message = await getCaughtMail((await props.params).id);
  if (!message) notFound();
  return (
    <div className="space-y-4">
      <p className="text-sm">
        <Link href="/dev/mail">← All caught mail</Link>
      </p>
      <h1 className="break-words">{message.subject || "(no subject)"}</h1>
      <dl className="card grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
        <dt className="muted">To</dt>
        <dd className="break-all">{message.to.join(", ")}</dd>
        <dt className="muted">From</dt>
        <dd className="break-all">{message.from ?? "—"}</dd>
        <dt className="muted">Received</dt>
        <dd className="num">
          {new Date(message.receivedAt).toLocaleString("en-GB", { dateStyle: "medium", timeStyle: "medium" })}
        </dd>
      </dl>
      {/* The text part, with its links made clickable; the HTML part is not rendered here on purpose. */}
      <pre
        className="card overflow-x-auto whitespace-pre-wrap break-words font-sans text-sm leading-relaxed"
        data-testid="mail-body"
      >
        {linkify(message.text).map((part, i) =>
          part.href ? (
            <a key={i} href={part.href} className="break-all">
              {part.text}
            </a>
          ) : (
            <span key={i}>{part.text}</span>
          ),
        )}
      </pre>
    </div>
  );
}
