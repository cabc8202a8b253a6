// Our e-mails, in our own words. Each returns a subject, a complete text part and a simple HTML part.
// Other features call these (submission receipt, answer receipt, review decision, new result on a pack);
// Auth.js sends the sign-in link through server/auth.ts. State and reason words come from lib/labels.ts, and
// every link about a result goes to the contributor's own view of it (/account/results/<id>), which exists
// in every state.
import { ownStatusLabels } from "@/lib/labels";
import { htmlMail } from "./html";

/** The sign-in e-mail's subject (the browser tests pick the sign-in link out of the catcher by it). */
export const SIGN_IN_SUBJECT = "Your Sagline sign-in link";

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
    subject: SIGN_IN_SUBJECT,
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

/** The result as e-mails name it: its number and its pack. */
type ResultRef = { resultId: number; packTitle: string; resultUrl: string };

export function submissionReceiptMail(p: ResultRef & { submittedAt: Date }): MailContent {
  const lead = `Thank you — we received result #${p.resultId} for ${p.packTitle} on ${when(p.submittedAt)}.`;
  const next =
    "A moderator will check it against its log and method card. You will get an e-mail when it is approved, or if they need an answer from you.";
  return {
    subject: `Result #${p.resultId} received: ${p.packTitle}`,
    text: [lead, "", next, "", `Follow it here: ${p.resultUrl}`, "", SIGN_OFF].join("\n"),
    html: htmlMail(`Result #${p.resultId} received`, [
      { kind: "p", text: lead },
      { kind: "p", text: next },
      { kind: "button", href: p.resultUrl, label: `Follow result #${p.resultId}` },
      { kind: "link", href: p.resultUrl },
    ]),
  };
}

export function answerReceiptMail(p: ResultRef & { answeredAt: Date }): MailContent {
  const lead = `We received your answer on result #${p.resultId} (${p.packTitle}) on ${when(p.answeredAt)}.`;
  const next = "It is back with the moderators, with your answer and the edited method card beside their request.";
  return {
    subject: `Answer received: result #${p.resultId}, ${p.packTitle}`,
    text: [lead, "", next, "", `Follow it here: ${p.resultUrl}`, "", SIGN_OFF].join("\n"),
    html: htmlMail(`Answer received: result #${p.resultId}`, [
      { kind: "p", text: lead },
      { kind: "p", text: next },
      { kind: "button", href: p.resultUrl, label: `Follow result #${p.resultId}` },
      { kind: "link", href: p.resultUrl },
    ]),
  };
}

export type ReviewDecision = "approved" | "rejected" | "awaiting_answer";

const decisionLead: Record<ReviewDecision, string> = {
  approved: "Your result has been approved and is now published with its method card.",
  rejected: "A moderator did not accept your result.",
  awaiting_answer: "A moderator sent your result back to you: they need your answer before it can be published.",
};
const decisionButton: Record<ReviewDecision, string> = {
  approved: "See your result",
  rejected: "See why",
  awaiting_answer: "Read the request and answer",
};

/** The contributor's e-mail about a decision; its subject is the result's new state in the contributor's words. */
export function reviewDecisionMail(p: ResultRef & { decision: ReviewDecision; reason: string | null }): MailContent {
  const state = ownStatusLabels[p.decision];
  const lead = `${decisionLead[p.decision]} (result #${p.resultId}, ${p.packTitle})`;
  const reason = p.reason?.trim() ? `Moderator's note: ${p.reason.trim()}` : null;
  return {
    subject: `${state}: result #${p.resultId}, ${p.packTitle}`,
    text: [lead, "", ...(reason ? [reason, ""] : []), `Open it here: ${p.resultUrl}`, "", SIGN_OFF].join("\n"),
    html: htmlMail(`Result #${p.resultId}: ${state.toLowerCase()}`, [
      { kind: "p", text: lead },
      ...(reason ? [{ kind: "p" as const, text: reason }] : []),
      { kind: "button", href: p.resultUrl, label: decisionButton[p.decision] },
      { kind: "link", href: p.resultUrl },
    ]),
  };
}

/** To someone who asked to be e-mailed new results on a pack. */
export function newResultOnPackMail(p: { packTitle: string; packUrl: string; accountUrl: string }): MailContent {
  return {
    subject: `New result: ${p.packTitle}`,
    text: [
      `A new result for ${p.packTitle} has been published.`,
      "",
      `See how it compares: ${p.packUrl}`,
      "",
      `You get this because you asked to be e-mailed new results for this pack. Stop these e-mails from your account: ${p.accountUrl}`,
      "",
      SIGN_OFF,
    ].join("\n"),
    html: htmlMail("New result on a pack", [
      { kind: "p", text: `A new result for ${p.packTitle} has been published.` },
      { kind: "button", href: p.packUrl, label: "See the pack" },
      {
        kind: "small",
        text: "You get this because you asked to be e-mailed new results for this pack. Stop these e-mails from your account:",
      },
      { kind: "link", href: p.accountUrl },
    ]),
  };
}
