// The figures-ratings-mapping migration's hand-written data step, run on rows as older code stored them: the like-for-like key's
// resistance part comes from what the analysis read on the log (figures.dcResistanceMethod), the other parts
// stay, and the measured rating is copied from the stored figures where they hold it. The statements are read
// from the migration file itself, so the test checks exactly what databases run.
import fs from "node:fs";
import path from "node:path";
import { eq, sql } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { db } from "@/db";
import { results } from "@/db/schema";
import { groupKey, groupKeyForAnalysis, type Figures } from "@/lib/analysis";
import { emptyCatalogue, makeMaker, makePack, makeResult, makeUser } from "../helpers/fixtures";

// Found by name in the journal, so the test follows the migration when migrations are renumbered at merge time.
const FOLDER = path.resolve(__dirname, "../../db/migrations");
const journal = JSON.parse(fs.readFileSync(path.join(FOLDER, "meta/_journal.json"), "utf8")) as {
  entries: { tag: string }[];
};
const TAG = journal.entries.find((e) => e.tag.endsWith("_figures-ratings-mapping"))?.tag;
if (!TAG) throw new Error("no figures-ratings-mapping migration in the journal");
const FILE = path.join(FOLDER, `${TAG}.sql`);
const dataStatements = () =>
  fs
    .readFileSync(FILE, "utf8")
    .split("--> statement-breakpoint")
    .map((s) => s.trim())
    .filter((s) => /^(--[^\n]*\n)*UPDATE "results"/.test(s));

const card = { ambientC: 22, cutoffVPerCell: 3.3, loadCurrentA: 12, ratedMah: 1500, cyclesBeforeTest: 0 };
const ids: Record<string, number> = {};

beforeAll(async () => {
  await emptyCatalogue();
  const tester = await makeUser();
  const m = await makeMaker("Migration Cells");
  const pack = await makePack(m.id);
  const stored = async (name: string, typed: string, figures: Partial<Figures>) => {
    const r = await makeResult(pack, tester.id, { method: "dc-step" });
    // As older code stored it: the key from the typed method, figures without the measured columns filled.
    await db
      .update(results)
      .set({
        groupKey: groupKey({ resistanceMethod: typed, ...card }).key,
        figures: sql`${JSON.stringify(figures)}::jsonb`,
        sustainedCMeasured: null,
        sustainedLabelRatio: null,
      })
      .where(eq(results.id, r.id));
    ids[name] = r.id;
  };
  await stored("readout-step", "charger-readout", { dcResistanceMethod: "step" });
  await stored("step-iec", "dc-step", { dcResistanceMethod: "iec-61960-two-level" });
  await stored("ac-none", "ac-1khz", { dcResistanceMethod: null, sustainedCMeasured: 8.1, sustainedLabelRatio: 0.162 });
  await stored("old", "charger-readout", {}); // figures without the field: left as they are
  for (const statement of dataStatements()) await db.execute(sql.raw(statement));
});

const keyOf = async (name: string) =>
  (
    await db
      .select({ k: results.groupKey })
      .from(results)
      .where(eq(results.id, ids[name] ?? 0))
  )[0]?.k;

describe("migration figures-ratings-mapping: group keys from the log", () => {
  it("finds the hand-written data statements in the migration", () => {
    expect(dataStatements()).toHaveLength(2);
  });

  it("gives each stored result the key groupKeyForAnalysis gives a new one", async () => {
    expect(await keyOf("readout-step")).toBe(groupKeyForAnalysis("step", card).key);
    expect(await keyOf("step-iec")).toBe(groupKeyForAnalysis("iec-61960-two-level", card).key);
    expect(await keyOf("ac-none")).toBe(groupKeyForAnalysis(null, card).key);
    expect(await keyOf("readout-step")).toBe("dc-step_a15-25_co3.3_r5-10_new");
  });

  it("leaves a result whose figures never recorded the method as it was", async () => {
    expect(await keyOf("old")).toBe(groupKey({ resistanceMethod: "charger-readout", ...card }).key);
  });

  it("copies the measured rating into its columns where the figures hold it", async () => {
    const [row] = await db
      .select()
      .from(results)
      .where(eq(results.id, ids["ac-none"] ?? 0));
    expect(row?.sustainedCMeasured).toBeCloseTo(8.1, 5);
    expect(row?.sustainedLabelRatio).toBeCloseTo(0.162, 5);
    const [old] = await db
      .select()
      .from(results)
      .where(eq(results.id, ids.old ?? 0));
    expect(old?.sustainedCMeasured).toBeNull();
  });
});
