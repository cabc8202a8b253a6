import type { Metadata } from "next";
import { z } from "zod";
import { LineFigure } from "@/components/charts/line-figure";
import { StaticIsland } from "@/components/static-island";
import { MAX_COMPARE, MIN_COMPARE } from "@/lib/compare";
import { compareChartData } from "@/lib/compare-charts";
import { packTitle } from "@/lib/format";
import { cachedCompareExamples, cachedComparison } from "@/server/public-data";
import { ComparePicker } from "./_components/compare-picker-client";
import { CompareTable } from "./_components/compare-table";

export const metadata: Metadata = {
  title: "Compare packs",
  description: "Two to six packs side by side, inside one like-for-like group, with overlaid discharge curves.",
};

// Bad search params fall back to sensible defaults: unknown slugs are dropped, a bad group picks the best one.
const search = z.object({
  packs: z
    .string()
    .max(1000)
    .optional()
    .transform((v) =>
      [
        ...new Set(
          (v ?? "")
            .split(",")
            .map((s) => s.trim())
            .filter((s) => /^[a-z0-9-]{1,120}$/.test(s)),
        ),
      ].slice(0, MAX_COMPARE),
    ),
  group: z
    .string()
    .regex(/^[a-z0-9._-]{3,120}$/)
    .optional()
    .catch(undefined),
});

export default async function ComparePage(props: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const raw = await props.searchParams;
  const parsed = search.safeParse({
    packs: typeof raw.packs === "string" ? raw.packs : undefined,
    group: typeof raw.group === "string" ? raw.group : undefined,
  });
  const { packs: slugs, group: wanted } = parsed.success ? parsed.data : { packs: [], group: undefined };
  const cmp = await cachedComparison(slugs, wanted ?? null);
  const selected = cmp.packs.map((p) => ({ slug: p.slug, title: packTitle(p) }));
  const charts = cmp.group ? compareChartData(cmp) : null;
  const suggestions = cmp.packs.length < MIN_COMPARE ? await cachedCompareExamples() : [];
  const qsFor = (group: string) => `/compare?packs=${cmp.packs.map((p) => p.slug).join(",")}&group=${group}`;

  return (
    <div className="space-y-6">
      <h1>Compare packs</h1>
      <ComparePicker selected={selected} group={cmp.group?.key ?? null} />
      {cmp.unknownSlugs.length ? (
        <p className="muted text-sm">Not in the catalogue (left out): {cmp.unknownSlugs.join(", ")}.</p>
      ) : null}

      {cmp.packs.length < MIN_COMPARE ? (
        <>
          <p className="muted">
            Add at least {MIN_COMPARE} packs to compare them. Or start from the <a href="/packs">packs table</a>.
          </p>
          {suggestions.length ? (
            <section aria-labelledby="examples-h" className="space-y-2">
              <h2 id="examples-h" className="text-base">
                Or start with packs of one size, tested the same way
              </h2>
              <ul className="space-y-2 text-sm" data-testid="compare-suggestions">
                {suggestions.map((sug) => (
                  <li key={sug.group.key} className="card space-y-1">
                    <a
                      href={`/compare?packs=${sug.packs.map((p) => p.slug).join(",")}&group=${sug.group.key}`}
                      className="font-medium"
                    >
                      {sug.cells}S {sug.capacityMah.toLocaleString("en-GB")} mAh — compare {sug.packs.length} packs
                    </a>
                    <p className="muted text-xs">{sug.packs.map((p) => p.title).join(" · ")}</p>
                    <p className="muted text-xs">{sug.group.label}</p>
                  </li>
                ))}
              </ul>
            </section>
          ) : null}
        </>
      ) : !cmp.group ? (
        <p className="muted">None of these packs has published results yet.</p>
      ) : (
        <>
          <section aria-labelledby="group-h" className="space-y-2">
            <h2 id="group-h" className="text-base">
              Like-for-like group
            </h2>
            <p className="text-sm" data-testid="compare-group">
              <strong>{cmp.group.label}</strong>
            </p>
            {cmp.groups.length > 1 ? (
              <>
                <p className="text-sm">Switch to another group these packs have results in:</p>
                <ul className="flex flex-wrap gap-2 text-sm" aria-label="Other groups these packs have results in">
                  {cmp.groups
                    .filter((g) => g.key !== cmp.group?.key)
                    .map((g) => (
                      <li key={g.key}>
                        <a
                          href={qsFor(g.key)}
                          className="inline-block rounded border border-ink/15 px-2 py-0.5 dark:border-night-line"
                        >
                          {g.label}{" "}
                          <span className="muted">
                            ({g.packsCovered} of {cmp.packs.length} packs)
                          </span>
                        </a>
                      </li>
                    ))}
                </ul>
              </>
            ) : null}
            <p className="muted text-xs">
              Figures are medians of published results inside this group only; results taken another way are listed
              under “Left out”.
            </p>
          </section>
          <StaticIsland id="cmp-table">
            <CompareTable packs={cmp.packs} compared={cmp.compared} />
          </StaticIsland>
          {charts ? (
            <section aria-labelledby="curves-h" className="space-y-4">
              <h2 id="curves-h">Curves</h2>
              <p className="muted text-sm">
                One result per pack: the one whose delivered capacity is closest to the pack&apos;s median in this
                group. Packs without a result here have no curve.
              </p>
              <StaticIsland id="cmp-charts" className="space-y-4">
                <LineFigure
                  id="cmp-mah"
                  title="Voltage per cell against capacity delivered"
                  xLabel="Capacity delivered (mAh)"
                  yLabel="Voltage per cell, V"
                  yDigits={3}
                  tableCaption="Discharge curves"
                  series={charts.byCapacity}
                />
                <LineFigure
                  id="cmp-share"
                  title="Voltage per cell against share of rated capacity"
                  xLabel="Delivered ÷ rated capacity (%)"
                  yLabel="Voltage per cell, V"
                  xDigits={0}
                  yDigits={3}
                  tableCaption="Discharge curves by share of rated capacity"
                  series={charts.byShare}
                />
                {charts.temperature.length ? (
                  <LineFigure
                    id="cmp-temp"
                    title="Pack temperature over time"
                    xLabel="Time (s)"
                    yLabel="Pack temperature, °C"
                    yUnit="temp"
                    yDigits={1}
                    tableCaption="Pack temperature"
                    series={charts.temperature}
                  />
                ) : null}
              </StaticIsland>
            </section>
          ) : null}
        </>
      )}
    </div>
  );
}
