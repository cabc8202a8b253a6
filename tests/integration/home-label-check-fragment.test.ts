// The home page's label check fragments (issue 15's static page, issue 12's two ratings): one group's chart and
// maker list, in the estimate at /fragments/label-check/{group} and in either rating at …/{group}/{rating}; each
// names its rating in the title, the axis (or the empty chart's message) and the label ratio; an unknown group or rating is a 404.
import { beforeAll, describe, expect, it, vi } from "vitest";
import { GET as estimateOnly } from "@/app/(public)/fragments/label-check/[group]/route";
import { GET as byRating } from "@/app/(public)/fragments/label-check/[group]/[rating]/route";
import { seedOpenData } from "../helpers/open-data-fixtures";

// Reads go through unstable_cache; outside Next.js every read goes to the database.
vi.mock("next/cache", async () => (await import("../helpers/next-mocks")).nextCache);

const req = (path: string) =>
  new Request(`http://localhost:3000${path}`, { headers: { "x-forwarded-for": "203.0.113.7" } });
let group = "";

beforeAll(async () => {
  group = (await seedOpenData("hlc")).group;
});

describe("GET /fragments/label-check/{group}[/{rating}]", () => {
  it("serves the estimate by default, named as an estimate, with its label ratio and a verdict on the makers", async () => {
    const res = await estimateOnly(req(`/fragments/label-check/${group}`), { params: Promise.resolve({ group }) });
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toContain("text/html");
    const html = await res.text();
    expect(html).toContain("Label check: labelled C against sag-limited C (estimate)");
    expect(html).toContain("Sag-limited C, an estimate from resistance (C)");
    expect(html).toContain("Label ratio (sag-limited C estimate ÷ labelled C)");
    expect(html).toContain('data-testid="ranking-verdict"');
    expect(html).not.toContain("Sustained C, measured");
  });

  it("serves the measured rating when asked, named as measured, and the estimate again under its own name", async () => {
    const measured = await byRating(req(`/fragments/label-check/${group}/measured`), {
      params: Promise.resolve({ group, rating: "measured" }),
    });
    expect(measured.status).toBe(200);
    const html = await measured.text();
    expect(html).toContain("Label check: labelled C against sustained C (measured)");
    // The fixture's runs hold no measured rating: the chart says so in the rating's own words, not the estimate's.
    expect(html).toContain("No published results with a sustained (measured) rating in this group yet.");
    expect(html).toContain("Label ratio (sustained C measured ÷ labelled C)");
    expect(html).not.toContain("an estimate from resistance");
    const estimate = await byRating(req(`/fragments/label-check/${group}/estimate`), {
      params: Promise.resolve({ group, rating: "estimate" }),
    });
    expect(await estimate.text()).toContain("Label check: labelled C against sag-limited C (estimate)");
  });

  it("is a 404 for a rating or a group it does not know", async () => {
    const badRating = await byRating(req(`/fragments/label-check/${group}/best`), {
      params: Promise.resolve({ group, rating: "best" }),
    });
    expect(badRating.status).toBe(404);
    const badGroup = await estimateOnly(req("/fragments/label-check/no-such-group"), {
      params: Promise.resolve({ group: "no-such-group" }),
    });
    expect(badGroup.status).toBe(404);
  });
});
