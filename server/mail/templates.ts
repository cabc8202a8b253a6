// Our e-mails, in our own words. Each returns a subject, a complete text part and a simple HTML part.
// Other features call these (submission receipt, review decision, watched pack); Auth.js sends the
// sign-in link through server/auth.ts.
import { htmlMail } from "./html";

export type MailContent = { subject: string; text: string; html: string | null };

const SIGN_OFF = "— Sagline";

function when(d: Date): string {
  return d.toLocaleString("en-GB", { dateStyle: "medium", timeStyle: "short", timeZone: "UTC" }) + " UTC";
}

export function signInLinkMail(p: { url: string; expires: Date }): MailContent {
  const lines = [
    "Use this link to sign in to Sagline:",
    "",
    p.url,
    "",
    `It works once and stops working on ${when(p.expires)}.`,
    "If you did not ask to sign in, ignore this e-mail: nobody can use your account without the link.",
    "",
    SIGN_OFF,
  ];
  return {
    subject: "Your Sagline sign-in link",
    text: lines.join("\n"),
    html: htmlMail("Sign in to Sagline", [
      { kind: "p", text: "Use the button below to sign in. No password is needed." },
      { kind: "button", href: p.url, label: "Sign in to Sagline" },
      { kind: "small", text: "If the button does not work, copy this address into your browser:" },
      { kind: "link", href: p.url },
      {
        kind: "small",
        text: `The link works once and stops working on ${when(p.expires)}. If you did not ask to sign in, ignore this e-mail.`,
      },
    ]),
  };
}

export function submissionReceiptMail(p: { packTitle: string; resultUrl: string; submittedAt: Date }): MailContent {
  return {
    subject: `Result received: ${p.packTitle}`,
    text: [
      `Thank you — we received your result for ${p.packTitle} on ${when(p.submittedAt)}.`,
      "",
      "A moderator will check it against its log and method card. You will get an e-mail when it is approved, or if they need something changed.",
      "",
      `Follow it here: ${p.resultUrl}`,
      "",
      SIGN_OFF,
    ].join("\n"),
    html: htmlMail("Result received", [
      { kind: "p", text: `Thank you — we received your result for ${p.packTitle} on ${when(p.submittedAt)}.` },
      {
        kind: "p",
        text: "A moderator will check it against its log and method card. You will get an e-mail when it is approved, or if they need something changed.",
      },
      { kind: "button", href: p.resultUrl, label: "View your result" },
    ]),
  };
}

export type ReviewDecision = "approved" | "rejected" | "changes_requested";

const decisionWords: Record<ReviewDecision, { subject: string; lead: string }> = {
  approved: {
    subject: "Result approved",
    lead: "Your result has been approved and is now published with its method card.",
  },
  rejected: { subject: "Result not accepted", lead: "A moderator did not accept your result." },
  changes_requested: {
    subject: "Changes requested",
    lead: "A moderator asks for a change before your result can be published.",
  },
};

export function reviewDecisionMail(p: {
  packTitle: string;
  decision: ReviewDecision;
  reason: string | null;
  resultUrl: string;
}): MailContent {
  const w = decisionWords[p.decision];
  const reason = p.reason?.trim() ? `Moderator's note: ${p.reason.trim()}` : null;
  return {
    subject: `${w.subject}: ${p.packTitle}`,
    text: [
      `${w.lead} (${p.packTitle})`,
      "",
      ...(reason ? [reason, ""] : []),
      `See it here: ${p.resultUrl}`,
      "",
      SIGN_OFF,
    ].join("\n"),
    html: htmlMail(w.subject, [
      { kind: "p", text: `${w.lead} (${p.packTitle})` },
      ...(reason ? [{ kind: "p" as const, text: reason }] : []),
      { kind: "button", href: p.resultUrl, label: "Open the result" },
    ]),
  };
}

export function watchedPackResultMail(p: { packTitle: string; packUrl: string; accountUrl: string }): MailContent {
  return {
    subject: `New result: ${p.packTitle}`,
    text: [
      `A new result for ${p.packTitle}, a pack you watch, has been published.`,
      "",
      `See how it compares: ${p.packUrl}`,
      "",
      `You get this because you watch this pack. Stop watching it from your account: ${p.accountUrl}`,
      "",
      SIGN_OFF,
    ].join("\n"),
    html: htmlMail("New result on a pack you watch", [
      { kind: "p", text: `A new result for ${p.packTitle} has been published.` },
      { kind: "button", href: p.packUrl, label: "See the pack" },
      { kind: "small", text: "You get this because you watch this pack. You can stop watching it from your account:" },
      { kind: "link", href: p.accountUrl },
    ]),
  };
}
