import { expect, test } from "@playwright/test";

test("pages carry the security headers and run under the content security policy", async ({ page }) => {
  const violations: string[] = [];
  page.on("console", (msg) => {
    if (msg.type() === "error" && /Content Security Policy/i.test(msg.text())) violations.push(msg.text());
  });
  const response = await page.goto("/");
  const headers = response?.headers() ?? {};
  expect(headers["x-frame-options"]).toBe("DENY");
  expect(headers["x-content-type-options"]).toBe("nosniff");
  expect(headers["referrer-policy"]).toBe("strict-origin-when-cross-origin");
  expect(headers["content-security-policy"]).toContain("frame-ancestors 'none'");
  expect(headers["content-security-policy"]).toContain("object-src 'none'");
  expect(headers["x-powered-by"]).toBeUndefined();
  // Hydration works under the policy: a client-side navigation happens without a full reload.
  await page.getByRole("link", { name: "Methods" }).first().click();
  await expect(page).toHaveURL(/\/methods/);
  expect(violations).toEqual([]);
});
