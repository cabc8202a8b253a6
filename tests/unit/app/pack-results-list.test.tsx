// A pack page lists at most PACK_PAGE_MAX_RESULTS results, the newest first, and says where it cut the list with
// links to the download and the API that hold them all; a pack with few results lists them all and says nothing.
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { ResultsList } from "@/app/(public)/packs/[slug]/_components/results-list";
import { PACK_PAGE_MAX_RESULTS } from "@/lib/bounded-lists";
import type { PublicResultRow } from "@/lib/pack-summary";
import { publicResultRow } from "../../helpers/public-result-row";

const row = (id: number): PublicResultRow & { groupLabel: string } => ({
  ...publicResultRow({ id }),
  // One result a day: a higher id is newer.
  publishedAt: new Date(Date.UTC(2026, 0, 1) + id * 86_400_000).toISOString(),
  groupLabel: "DC step · 15–25 °C",
});

const ids = (html: string) => [...html.matchAll(/Result #(\d+)/g)].map((m) => Number(m[1]));

describe("a pack page's results list", () => {
  it("keeps the newest PACK_PAGE_MAX_RESULTS and links to all of them", () => {
    const rows = Array.from({ length: 50 }, (_, i) => row(i + 1));
    const html = renderToStaticMarkup(<ResultsList results={rows} cells={4} packSlug="ridge-1800" />);
    expect(ids(html)).toEqual(Array.from({ length: PACK_PAGE_MAX_RESULTS }, (_, i) => 50 - i));
    expect(html).toContain(`Showing ${PACK_PAGE_MAX_RESULTS} of 50 results`);
    expect(html).toContain('href="/data/download/results.csv?pack=ridge-1800"');
    expect(html).toContain('href="/api/v1/results?pack=ridge-1800"');
  });

  it("lists a few results whole, without a note", () => {
    const html = renderToStaticMarkup(<ResultsList results={[row(2), row(7), row(4)]} cells={4} packSlug="p" />);
    expect(ids(html)).toEqual([7, 4, 2]);
    expect(html).not.toContain("Showing");
  });

  it("gives each result its method in one line, temperatures marked for the reader's units", () => {
    const r = { ...row(3), ambientTemperatureC: 21.4, packStartTemperatureC: 22, stopTemperatureC: 60 };
    const html = renderToStaticMarkup(<ResultsList results={[r]} cells={4} packSlug="p" />);
    const line = /<p[^>]*data-testid="method-line"[^>]*>(.*?)<\/p>/.exec(html)?.[1] ?? "";
    const text = line.replace(/<[^>]+>/g, "").replace(/&#x27;/g, "'");
    expect(text).toContain("Method: 21.4 °C ambient, pack at 22.0 °C;");
    expect(text).toContain(`to ${r.cutoffVPerCell.toFixed(2)} V per cell, stop at 60 °C;`);
    expect(text).toMatch(/resistance: [^;]+; \d+ cycles? before the test\./);
    expect(line.match(/data-u="temp"/g)).toHaveLength(3);
  });
});
