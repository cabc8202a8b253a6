// Demo bench profiles with their stated instrument accuracy, and the campaigns that make bench agreement show:
// five benches test the same five packs in one like-for-like group (DC step, 20–24 °C, 3.3 V, 8C, new packs), each
// test within ±0.4 % of the pack's truth. (Algorithm A needs about five benches to single out one: with three or
// four its s* widens around the odd one out.) Four agree; the Copperleat bench's current shunt reads 4 % high (invented, as everything here), so its capacity
// and energy read high and its resistance low, and one of its results waits in the review queue with a |z| > 3
// warning. Every name is invented; the accuracy values are the default classes' (assumed, from memory).
import { and, eq } from "drizzle-orm";
import type { NodePgDatabase } from "drizzle-orm/node-postgres";
import * as schema from "@/db/schema";
import { ACCURACY_CLASSES } from "@/lib/analysis/uncertainty";
import type { Campaign } from "./results";

type BenchSeed = Omit<typeof schema.benchProfiles.$inferInsert, "userId" | "id">;

function stated(key: keyof typeof ACCURACY_CLASSES, parts: { temperature?: boolean } = {}): Partial<BenchSeed> {
  const a = ACCURACY_CLASSES[key].accuracy;
  return {
    voltageAccuracyPct: a.voltage.percentOfReading,
    voltageOffsetV: a.voltage.offsetV,
    voltageResolutionV: a.voltage.resolutionV,
    currentAccuracyPct: a.current.percentOfReading,
    currentOffsetA: a.current.offsetA,
    currentResolutionA: a.current.resolutionA,
    ...(parts.temperature === false
      ? {}
      : {
          temperatureAccuracyPct: a.temperature.percentOfReading,
          temperatureOffsetC: a.temperature.offsetC,
          temperatureResolutionC: a.temperature.resolutionC,
        }),
    samplingIntervalS: a.samplingIntervalS,
  };
}

export const DEMO_BENCHES: Record<string, BenchSeed> = {
  "heronsgate@sagline.localhost": {
    name: "Heronsgate calibrated bench",
    loadEquipment: "Electronic load 300 W with a 0.1 % shunt",
    logger: "Bench multimeter logging at 2 Hz",
    resistanceMethod: "dc-step",
    calibratedOn: "2026-09-14",
    ...stated("bench-meter-logger"),
  },
  "wherry@sagline.localhost": {
    name: "Wherry Lane load",
    loadEquipment: "Programmable load 400 W",
    resistanceMethod: "dc-step",
    ...stated("electronic-load-logger"),
  },
  "millrace@sagline.localhost": {
    name: "Millrace club bench",
    loadEquipment: "Electronic load 250 W",
    resistanceMethod: "dc-step",
    ...stated("electronic-load-logger", { temperature: false }),
  },
  "saltings@sagline.localhost": {
    name: "Saltings bench",
    loadEquipment: "Electronic load 350 W",
    resistanceMethod: "dc-step",
    ...stated("electronic-load-logger"),
  },
  "copperleat@sagline.localhost": {
    name: "Copperleat garage rig",
    loadEquipment: "Home-built load with a hall-effect current sensor",
    resistanceMethod: "dc-step",
    ...stated("hobby-charger-readout", { temperature: false }),
  },
};

const shared = {
  method: "dc-step" as const,
  ambientC: [20, 24] as [number, number],
  cutoffVPerCell: 3.3,
  cRate: 8,
  // The last five packs of the catalogue (the last maker), so the first packs of lists keep their few results.
  owns: (i: number) => i >= 40,
  spread: 0.004,
};

export const agreementCampaigns: Campaign[] = [
  {
    ...shared,
    contributor: "heronsgate@sagline.localhost",
    cycles: [0],
    equipment: "Electronic load 300 W, 0.1 % shunt read by a bench multimeter, thermistor on the pack",
    dialect: {},
    outcome: () => "approved",
  },
  {
    ...shared,
    contributor: "wherry@sagline.localhost",
    cycles: [0],
    equipment: "Programmable load 400 W with its own logging, thermocouple on the pack face",
    dialect: {},
    outcome: () => "approved",
  },
  {
    ...shared,
    contributor: "millrace@sagline.localhost",
    cycles: [0],
    equipment: "Electronic load 250 W and a USB logger, club workshop",
    dialect: {},
    outcome: () => "approved",
  },
  {
    ...shared,
    contributor: "saltings@sagline.localhost",
    cycles: [0],
    equipment: "Electronic load 350 W with its own logging, thermistor taped to the pack",
    dialect: {},
    outcome: () => "approved",
  },
  {
    ...shared,
    contributor: "copperleat@sagline.localhost",
    cycles: [0, 1],
    equipment: "Home-built load, hall-effect current sensor, logger at 1 Hz",
    dialect: {},
    currentGain: 1.04,
    // Its second test of the first pack waits for review: the queue shows the |z| > 3 warning.
    outcome: (i, cycles) => (i === 40 && cycles === 1 ? "pending" : "approved"),
  },
];

/** The contributor's demo bench profile (found by name, else created); null for testers without one. */
export async function demoBenchId(
  db: NodePgDatabase<typeof schema>,
  email: string,
  userId: string,
): Promise<number | null> {
  const bench = DEMO_BENCHES[email];
  if (!bench) return null;
  const where = and(eq(schema.benchProfiles.userId, userId), eq(schema.benchProfiles.name, bench.name));
  const [found] = await db.select({ id: schema.benchProfiles.id }).from(schema.benchProfiles).where(where);
  if (found) return found.id;
  const [made] = await db
    .insert(schema.benchProfiles)
    .values({ ...bench, userId })
    .returning({ id: schema.benchProfiles.id });
  return made?.id ?? null;
}
