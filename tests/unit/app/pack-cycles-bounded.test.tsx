// A much-tested pack's "results at different cycle counts" charts draw at most PACK_PAGE_MAX_CYCLE_POINTS results,
// the newest, and say that the fit uses every one; a pack with few results draws them all and says nothing.
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { CyclesSection } from "@/app/(public)/packs/[slug]/_components/cycles-section";
import { PACK_PAGE_MAX_CYCLE_POINTS } from "@/lib/bounded-lists";
import { packAgeing } from "@/lib/pack-summary";
import { publicResultRow } from "../../helpers/public-result-row";

/** `count` results of one method at cycle counts 0, 10, 20…, capacity falling 0.1 % per cycle. */
const rows = (count: number) =>
  Array.from({ length: count }, (_, i) =>
    publicResultRow({
      cyclesBeforeTest: i * 10,
      capacityMah: 1900 * (1 - 0.001 * i * 10),
      dcResistanceMohm: 10 + i / 10,
    }),
  );
/** Markers of the results' series (palette colour 0, circles) in the capacity chart. */
const drawnResults = (html: string) => html.match(/<use href="#pack-kept-c0"/g)?.length ?? 0;

describe("a pack page's results at different cycle counts", () => {
  it("draws the newest results up to the cap and says the fit uses all", () => {
    const many = PACK_PAGE_MAX_CYCLE_POINTS + 16;
    const html = renderToStaticMarkup(<CyclesSection ageing={packAgeing(rows(many))} cells={4} />);
    expect(drawnResults(html)).toBe(PACK_PAGE_MAX_CYCLE_POINTS);
    expect(html).toContain(
      `The newest ${PACK_PAGE_MAX_CYCLE_POINTS} of ${many} results are drawn; the fitted line and the projection use all of them.`,
    );
  });

  it("draws every result of a pack tested a few times, without a note", () => {
    const html = renderToStaticMarkup(<CyclesSection ageing={packAgeing(rows(5))} cells={4} />);
    expect(drawnResults(html)).toBe(5);
    expect(html).not.toContain("ageing-across-cut");
  });
});
