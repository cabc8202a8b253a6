import { describe, expect, it } from "vitest";
import { escapeHtml } from "@/server/mail/html";
import {
  reviewDecisionMail,
  signInLinkMail,
  submissionReceiptMail,
  watchedPackResultMail,
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
      packTitle: `Evil <script>alert("x")</script>`,
      resultUrl: "http://localhost:3011/results/1",
      submittedAt: new Date(),
    });
    expect(m.html).not.toContain("<script>");
    expect(m.html).toContain("&lt;script&gt;");
    expect(m.text).toContain(`Evil <script>`); // the text part is plain text
  });

  it("words each review decision differently and includes the moderator's reason", () => {
    const base = { packTitle: "Heron 1300", resultUrl: "http://localhost:3011/results/7" };
    expect(reviewDecisionMail({ ...base, decision: "approved", reason: null }).subject).toBe(
      "Result approved: Heron 1300",
    );
    const changes = reviewDecisionMail({
      ...base,
      decision: "changes_requested",
      reason: "Log is missing the temperature column.",
    });
    expect(changes.subject).toBe("Changes requested: Heron 1300");
    expect(changes.text).toContain("Moderator's note: Log is missing the temperature column.");
    expect(reviewDecisionMail({ ...base, decision: "rejected", reason: " " }).text).not.toContain("Moderator's note");
  });

  it("tells a watcher how to stop watching", () => {
    const m = watchedPackResultMail({
      packTitle: "Heron 1300",
      packUrl: "http://localhost:3011/packs/heron",
      accountUrl: "http://localhost:3011/account",
    });
    expect(m.text).toMatch(/Stop watching it from your account: http:\/\/localhost:3011\/account/);
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
