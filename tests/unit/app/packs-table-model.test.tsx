// The /packs table the server builds from a @tanstack/react-table row model (pack-table-model.tsx) is the table
// the browser draws from the same page (pack-table.tsx): same markup, row for row, under React DOM and under the
// static-island writer (components/charts/draw/markup.ts) that sends it.
import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, it } from "vitest";
import { ServerPackTable } from "@/app/(public)/packs/_components/pack-table-model";
import { PACK_COLUMNS, PackTable } from "@/app/(public)/packs/_components/pack-table";
import type { ApiPackPage, ApiPackRow } from "@/app/(public)/packs/_components/types";
import { toMarkup } from "@/components/charts/draw/markup";
import { DEFAULT_PACK_PARAMS } from "@/lib/pack-query-params";

const row = (i: number, o: Partial<ApiPackRow> = {}): ApiPackRow => ({
  id: i,
  slug: `tern-${i}`,
  makerId: 1,
  model: `Tern ${1000 + i * 100} 4S`,
  makerName: "Tidewell",
  makerSlug: "tidewell",
  cellsInSeries: 4,
  ratedCapacityMah: 1000 + i * 100,
  labelledContinuousC: 50,
  labelledBurstC: i % 2 ? 100 : null,
  weightG: i % 3 ? 150 + i : null,
  connector: "XT60",
  resultCount: i % 2,
  groupCount: i % 2,
  measuredC: i % 2 ? 40 + i : null,
  labelRatio: i % 2 ? 0.8 : null,
  capacityRatio: null,
  groupN: i % 2,
  ...o,
});

describe("the server's packs table (row model from @tanstack/react-table)", () => {
  const page: ApiPackPage = {
    data: [row(3), row(1), row(2, { makerName: "Ashgrove" })],
    page: 1,
    pageCount: 2,
    total: 4,
  };

  it("draws exactly the browser's table, in the page's order", () => {
    for (const params of [
      DEFAULT_PACK_PARAMS,
      { ...DEFAULT_PACK_PARAMS, group: "g", sort: "measuredC" as const, dir: "desc" as const },
    ]) {
      const server = renderToStaticMarkup(<ServerPackTable page={page} params={params} />);
      expect(server).toBe(renderToStaticMarkup(<PackTable page={page} params={params} />));
      expect(toMarkup(<ServerPackTable page={page} params={params} />)).toBe(server);
      // One header cell per column, one row per pack, in the order given (the one pack filter's order).
      expect(server.match(/<th scope="col"/g)).toHaveLength(PACK_COLUMNS.length + 1);
      expect([...server.matchAll(/href="\/packs\/([^"]+)"/g)].map((m) => m[1])).toEqual(["tern-3", "tern-1", "tern-2"]);
    }
  });

  it("marks the sorted column for assistive technology", () => {
    const server = renderToStaticMarkup(
      <ServerPackTable page={page} params={{ ...DEFAULT_PACK_PARAMS, sort: "capacity", dir: "desc" }} />,
    );
    expect(server).toMatch(/<th scope="col" class="c-capacity n" aria-sort="descending">/);
    expect(server).toMatch(/<th scope="col" class="pack" aria-sort="none">/);
  });

  it("draws an empty page with its headers and the empty message", () => {
    const empty: ApiPackPage = { data: [], page: 1, pageCount: 1, total: 0 };
    const server = renderToStaticMarkup(<ServerPackTable page={empty} params={DEFAULT_PACK_PARAMS} />);
    expect(server).toBe(renderToStaticMarkup(<PackTable page={empty} params={DEFAULT_PACK_PARAMS} />));
    expect(server).toContain('data-testid="packs-empty"');
  });
});
