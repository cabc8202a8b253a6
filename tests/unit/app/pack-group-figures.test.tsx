// A pack page's figures table keeps its size: it shows the like-for-like groups with the most results, says how
// many it shows of how many, and links to the page with all of them; that page (no limit) shows every group.
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { GroupFiguresTable } from "@/app/(public)/packs/[slug]/_components/group-figures";
import { PACK_PAGE_MAX_GROUPS } from "@/lib/bounded-lists";
import { figuresByGroup } from "@/lib/pack-summary";
import { publicResultRow } from "../../helpers/public-result-row";

// Results in several groups (cut-off and ambient bands differ); the first group gets the most results.
const rows = [3.0, 3.2, 3.3, 3.5, 3.6]
  .flatMap((cutoffVPerCell) =>
    [5, 20, 30].map((ambientTemperatureC) => ({
      cutoffVPerCell,
      ambientTemperatureC,
      groupKey: `dc-step_a${ambientTemperatureC}_co${cutoffVPerCell}_r5-10_new`,
    })),
  )
  .flatMap((m, i) => Array.from({ length: i === 0 ? 3 : 1 }, () => publicResultRow(m)));
const groups = figuresByGroup(rows);
const bodyRows = (html: string) => [...html.matchAll(/<tr><th scope="row">([^<]*)/g)].map((m) => m[1]);

describe("a pack page's figures table", () => {
  it("has more groups than the page shows (the fixture is meaningful)", () => {
    expect(groups.length).toBeGreaterThan(PACK_PAGE_MAX_GROUPS);
  });

  it("shows the groups with the most results, up to the limit, and links to all of them", () => {
    const html = renderToStaticMarkup(
      <GroupFiguresTable
        groups={groups}
        labelledC={100}
        ratedMah={2000}
        cells={4}
        limit={PACK_PAGE_MAX_GROUPS}
        fullHref="/packs/p/groups"
      />,
    );
    const shown = bodyRows(html);
    expect(shown).toHaveLength(PACK_PAGE_MAX_GROUPS);
    expect(shown[0]).toBe(groups[0]?.group.label);
    expect(groups[0]?.n).toBe(3);
    expect(html).toContain(`Showing ${PACK_PAGE_MAX_GROUPS} of ${groups.length} like-for-like groups`);
    expect(html).toContain(`<a href="/packs/p/groups">All ${groups.length} groups →</a>`);
  });

  it("shows every group without a limit, and no note", () => {
    const html = renderToStaticMarkup(<GroupFiguresTable groups={groups} labelledC={100} ratedMah={2000} cells={4} />);
    expect(bodyRows(html)).toHaveLength(groups.length);
    expect(html).not.toContain("Showing");
  });
});
