import { describe, expect, it } from "vitest";
import { escapeHtml } from "@/server/mail/html";
import {
  reviewDecisionMail,
  signInLinkMail,
  submissionReceiptMail,
  newResultOnPackMail,
  answerReceiptMail,
} from "@/server/mail/templates";
import { linkify } from "@/server/mail/catcher";

const url = "http://localhost:3011/api/auth/callback/nodemailer?callbackUrl=%2Faccount&token=abc&email=a%40b.example";

describe("mail templates", () => {
  it("puts the sign-in link in both parts, with its expiry, and escapes it in the HTML", () => {
    const m = signInLinkMail({ url, expires: new Date("2026-03-01T12:00:00Z") });
    expect(m.subject).toBe("Your Sagline sign-in link");
    expect(m.text).toContain(url);
    expect(m.text).toContain("1 Mar 2026");
    expect(m.html).toContain(url.replaceAll("&", "&amp;"));
    expect(m.html).not.toContain("&token=abc"); // raw ampersands would be invalid HTML
  });

  it("escapes names from users in the HTML part", () => {
    const m = submissionReceiptMail({
      resultId: 1,
      packTitle: `Evil <script>alert("x")</script>`,
      resultUrl: "http://localhost:3011/account/results/1",
      submittedAt: new Date(),
    });
    expect(m.html).not.toContain("<script>");
    expect(m.html).toContain("&lt;script&gt;");
    expect(m.text).toContain(`Evil <script>`); // the text part is plain text
  });

  it("carries the result's number and the link to the contributor's view in receipts", () => {
    const url = "http://localhost:3011/account/results/42";
    const receipt = submissionReceiptMail({
      resultId: 42,
      packTitle: "Heron 1300",
      resultUrl: url,
      submittedAt: new Date(),
    });
    expect(receipt.subject).toBe("Result #42 received: Heron 1300");
    expect(receipt.text).toContain(`Follow it here: ${url}`);
    const answer = answerReceiptMail({ resultId: 42, packTitle: "Heron 1300", resultUrl: url, answeredAt: new Date() });
    expect(answer.subject).toBe("Answer received: result #42, Heron 1300");
    expect(answer.html).toContain(url);
  });

  it("names each decision with the result's new state in the contributor's words, and includes the moderator's note", () => {
    const base = { resultId: 7, packTitle: "Heron 1300", resultUrl: "http://localhost:3011/account/results/7" };
    expect(reviewDecisionMail({ ...base, decision: "approved", reason: null }).subject).toBe(
      "Approved and published: result #7, Heron 1300",
    );
    const asked = reviewDecisionMail({
      ...base,
      decision: "awaiting_answer",
      reason: "Log is missing the temperature column.",
    });
    expect(asked.subject).toBe("Waiting for your answer: result #7, Heron 1300");
    expect(asked.text).toContain("Moderator's note: Log is missing the temperature column.");
    expect(asked.text).toContain("Open it here: http://localhost:3011/account/results/7");
    expect(asked.subject + asked.text).not.toMatch(/changes requested|awaiting_answer/i);
    const rejected = reviewDecisionMail({ ...base, decision: "rejected", reason: " " });
    expect(rejected.subject).toBe("Not accepted: result #7, Heron 1300");
    expect(rejected.text).not.toContain("Moderator's note");
  });

  it("tells someone on a pack's e-mail list why they get it and how to stop", () => {
    const m = newResultOnPackMail({
      packTitle: "Heron 1300",
      packUrl: "http://localhost:3011/packs/heron",
      accountUrl: "http://localhost:3011/account",
    });
    expect(m.text).toMatch(/Stop these e-mails from your account: http:\/\/localhost:3011\/account/);
    expect(m.text).not.toMatch(/watch/i);
  });

  it("escapes the five HTML-special characters", () => {
    expect(escapeHtml(`<a href="x">'&'</a>`)).toBe("&lt;a href=&quot;x&quot;&gt;&#39;&amp;&#39;&lt;/a&gt;");
  });

  it("linkify splits text around http(s) links only", () => {
    expect(linkify(`Open ${url}\nthen javascript:alert(1)`)).toEqual([
      { text: "Open " },
      { text: url, href: url },
      { text: "\nthen javascript:alert(1)" },
    ]);
  });
});
