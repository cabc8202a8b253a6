// The demo scenario: an invented world of makers, packs and testers. No real brand, product or person.
// Each pack carries a hidden "truth" (cell resistance, real capacity) from which synthetic logs are
// generated and then analysed — figures are computed, never typed.
import { slugify } from "@/lib/slug";
import { createRandom } from "./random";

export type DemoUser = {
  email: string;
  displayName: string;
  role: "contributor" | "moderator" | "admin";
  anonymous?: boolean;
};
export type DemoMaker = { slug: string; name: string; honesty: number; series: string[] };
export type DemoPack = {
  slug: string;
  makerSlug: string;
  model: string;
  cellsInSeries: number;
  ratedCapacityMah: number;
  labelledContinuousC: number;
  labelledBurstC: number | null;
  weightG: number;
  connector: string;
  truth: { capacityFactor: number; r0PerCellMohm: number };
};

export const demoUsers: DemoUser[] = [
  { email: "admin@sagline.localhost", displayName: "Site admin", role: "admin" },
  { email: "moderator@sagline.localhost", displayName: "Moderator Tern", role: "moderator" },
  { email: "moderator2@sagline.localhost", displayName: "Moderator Wren", role: "moderator" },
  { email: "ridgeline@sagline.localhost", displayName: "Ridgeline Bench", role: "contributor" },
  { email: "coldframe@sagline.localhost", displayName: "Coldframe Lab", role: "contributor" },
  { email: "marsh@sagline.localhost", displayName: "Marsh Field Tests", role: "contributor" },
  { email: "quarry@sagline.localhost", displayName: "Quarry Flyers Club", role: "contributor" },
  { email: "slipway@sagline.localhost", displayName: "Slipway Hobby Bench", role: "contributor" },
  { email: "anon@sagline.localhost", displayName: "Tester 9", role: "contributor", anonymous: true },
  { email: "tidemill@sagline.localhost", displayName: "Tidemill Cycling Rig", role: "contributor" },
  // The bench agreement demo (scripts/seed/benches.ts): four benches that agree and one whose sensor reads high.
  { email: "heronsgate@sagline.localhost", displayName: "Heronsgate Test Bench", role: "contributor" },
  { email: "wherry@sagline.localhost", displayName: "Wherry Lane Workshop", role: "contributor" },
  { email: "millrace@sagline.localhost", displayName: "Millrace Flyers", role: "contributor" },
  { email: "saltings@sagline.localhost", displayName: "Saltings Bench", role: "contributor" },
  { email: "copperleat@sagline.localhost", displayName: "Copperleat Garage", role: "contributor" },
];

// honesty: measured C ÷ labelled C that this maker's packs tend to reach (their cells are what they are;
// the label is marketing). Lower means more overstated.
export const demoMakers: DemoMaker[] = [
  { slug: "ashcombe-cells", name: "Ashcombe Cells", honesty: 0.85, series: ["Ridge", "Summit"] },
  { slug: "brackwater-power", name: "Brackwater Power", honesty: 0.45, series: ["Torrent", "Surge"] },
  { slug: "corvane", name: "Corvane", honesty: 0.7, series: ["Glide", "Vector"] },
  { slug: "dunlin-energy", name: "Dunlin Energy", honesty: 0.3, series: ["Flash", "Max"] },
  { slug: "fellrunner", name: "Fellrunner", honesty: 0.95, series: ["Trail", "Endure"] },
  { slug: "glimwatt", name: "Glimwatt", honesty: 0.55, series: ["Spark", "Nova"] },
  { slug: "hollowmere", name: "Hollowmere", honesty: 0.65, series: ["Tarn", "Mere"] },
  { slug: "kitebrook", name: "Kitebrook", honesty: 0.4, series: ["Gust", "Updraft"] },
  { slug: "larkspire-power", name: "Larkspire Power", honesty: 0.75, series: ["Lark", "Spire"] },
  { slug: "nettlefield", name: "Nettlefield", honesty: 0.6, series: ["Sting", "Field"] },
];

const capacities = [450, 550, 650, 850, 1000, 1300, 1500, 1800, 2200, 3300, 4000, 5000, 6500, 8000] as const;
const labelledCs = [25, 35, 45, 50, 60, 75, 95, 100, 120, 130] as const;

function connectorFor(mah: number, pick: <T>(xs: readonly T[]) => T): string {
  if (mah <= 650) return pick(["JST-PH", "XT30"]);
  if (mah <= 1500) return pick(["XT30", "XT60"]);
  if (mah <= 5000) return pick(["XT60", "XT60", "EC5", "T-plug"]);
  return pick(["XT90", "EC5"]);
}

export function buildPacks(): DemoPack[] {
  const rnd = createRandom(20261202);
  const out: DemoPack[] = [];
  for (const maker of demoMakers) {
    const count = rnd.int(4, 5);
    for (let i = 0; i < count; i++) {
      const cells = rnd.int(2, 6);
      const mah = rnd.pick(capacities);
      const labelledC = rnd.pick(labelledCs);
      const burst = rnd.next() < 0.6 ? labelledC * 2 : null;
      // Cell resistance scales inversely with capacity. Choose it so the pack sags 0.4 V per cell at the
      // rate its maker's honesty suggests, kept within 2–16 mΩ·Ah (hobby LiPo cells, from memory).
      const targetC = labelledC * maker.honesty * rnd.between(0.85, 1.15);
      const mOhmAh = Math.min(16, Math.max(2, 400 / targetC));
      const r0 = mOhmAh / (mah / 1000);
      const specificWhKg = rnd.between(130, 175);
      const weightG = Math.round(((cells * 3.7 * mah) / 1000 / specificWhKg) * 1000 + cells * 2 + 8);
      const series = rnd.pick(maker.series);
      const model = `${series} ${mah} ${cells}S ${labelledC}C`;
      out.push({
        slug: slugify(`${maker.name} ${model}`),
        makerSlug: maker.slug,
        model,
        cellsInSeries: cells,
        ratedCapacityMah: mah,
        labelledContinuousC: labelledC,
        labelledBurstC: burst,
        weightG,
        connector: connectorFor(mah, rnd.pick),
        truth: { capacityFactor: rnd.between(0.86, 1.02), r0PerCellMohm: r0 },
      });
    }
  }
  // Unique slugs (two identical models from one maker get a suffix).
  const seen = new Map<string, number>();
  for (const p of out) {
    const n = seen.get(p.slug) ?? 0;
    seen.set(p.slug, n + 1);
    if (n > 0) p.slug = `${p.slug}-${n + 1}`;
  }
  return out;
}
