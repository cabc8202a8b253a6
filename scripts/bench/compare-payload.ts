// The chart payload /compare hands to the browser for six packs of the demo's largest like-for-like group:
// the series passed to its chart components, as JSON (and gzipped, as it travels).
import { gzipSync } from "node:zlib";
import { closeDb } from "@/db";
import { getComparison } from "@/db/queries/compare";
import { listPacksInGroup, listPublicGroups } from "@/db/queries/groups";
import { compareChartData } from "@/lib/compare-charts";

async function main() {
  const [group] = await listPublicGroups();
  if (!group) throw new Error("the demo database has no published results (run the seed)");
  const slugs = (await listPacksInGroup(group.key)).slice(0, 6).map((p) => p.packSlug);
  const cmp = await getComparison(slugs, group.key);
  const charts = compareChartData(cmp);
  const json = JSON.stringify(charts);
  const points = [...charts.byCapacity, ...charts.byShare, ...charts.temperature].reduce(
    (n, s) => n + s.points.length,
    0,
  );
  const kb = (n: number) => (n / 1024).toFixed(1);
  console.log(
    `chart payload of /compare with ${cmp.packs.length} packs: ${kb(Buffer.byteLength(json))} KB JSON, ${kb(gzipSync(json).length)} KB gzip (${points} points in 3 charts; target ≤ 100 KB)`,
  );
  await closeDb();
}

main().catch((err: unknown) => {
  console.error(`sagline: error: ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
});
