// Response schemas of the public routes that are not data lists: POST /api/v1/analyse (the CLI's JSON),
// oEmbed, a reader's flag and GET /api/v1/me.
import { z } from "zod";
import { WARNING_CODES, type CurvePoint, type PublicFigures } from "@/lib/analysis";
import { userRoles } from "@/lib/enums";

const n = z.number().nullable();
const curvePoint = z.object({
  timeS: z.number(),
  voltageV: z.number(),
  currentA: z.number(),
  temperatureC: z.number().nullable(),
  capacityMah: z.number(),
});

const discharge = z.object({
  index: z.number().int(),
  startS: z.number(),
  durationS: z.number(),
  capacityMah: z.number(),
  energyWh: z.number(),
  meanCurrentA: z.number(),
  meanVoltageV: z.number(),
  minVoltageV: z.number(),
  reachedCutoff: z.boolean(),
  peakTemperatureC: n,
});
const trend = z.object({ slopePerCycle: z.number(), intercept: z.number(), cyclesTo80: n, r2: n });
const retention = z.object({
  reference: z.enum(["rated", "first"]),
  referenceMah: z.number(),
  points: z.array(z.object({ cycle: z.number(), capacityMah: z.number(), retained: z.number() })),
  trend: trend.nullable(),
  cyclesTo80: n,
  extrapolated: z.boolean(),
  projectionNote: z.string(),
});
const sagLimitedAssumptions = z.object({
  nominalVPerCell: z.number(),
  floorVPerCell: z.number(),
  resistancePoint: z.enum(["hold", "step-1s"]),
  resistanceAtS: z.number(),
  resistanceMohm: z.number(),
  currentA: z.number(),
  temperatureC: n,
  indicative: z.boolean(),
});
const sustainedCRule = z.object({
  floorVPerCell: z.number(),
  stopTemperatureC: z.number(),
  floorHeldShare: z.number(),
  maxCurrentSpread: z.number(),
  minDeliveredShare: z.number(),
});
const sustainedCReason = z.enum([
  "no-rated-capacity",
  "cells-unknown",
  "cutoff-not-reached",
  "no-temperature",
  "stop-temperature-reached",
  "fell-below-floor",
  "cell-below-cutoff",
  "current-not-steady",
  "partial-discharge",
]);

/** toPublicFigures(): every figure of lib/analysis at the top level, then the parameters used. */
export const analyseResponse = z
  .object({
    samples: z.number().int(),
    skippedLines: z.number().int(),
    durationS: z.number(),
    cells: z.number().int().nullable(),
    capacityMah: n,
    energyWh: n,
    meanVoltageV: n,
    meanVoltagePerCellV: n,
    minVoltageV: n,
    minVoltagePerCellV: n,
    peakCurrentA: n,
    startTemperatureC: n,
    peakTemperatureC: n,
    temperatureRiseC: n,
    timeToCutoffS: n,
    reachedCutoff: z.boolean(),
    cutoffSource: z.enum(["stated", "log-end"]).nullable(),
    timeToStopTemperatureS: n,
    holdVoltagePerCellV: n,
    dcResistanceMohm: n,
    dcResistancePerCellMohm: n,
    dcResistanceMethod: z.enum(["iec-61960-two-level", "step"]).nullable(),
    resistanceAt25CMohm: n,
    resistanceTemperatureC: n,
    dcResistanceIndicative: z.boolean(),
    sagLimitedCEstimate: n,
    sagLimitedCAssumptions: sagLimitedAssumptions.nullable(),
    sagLimitedC: n,
    sustainedCMeasured: n,
    sustainedCReason: sustainedCReason.nullable(),
    sustainedCRule: sustainedCRule,
    capacityRatio: n,
    labelRatio: n,
    sustainedLabelRatio: n,
    specificEnergyWhKg: n,
    specificPowerWKg: n,
    mainDischargeCurrentA: n,
    mainDischargeDurationS: n,
    mainDischargeCapacityMah: n,
    mainDischargeEnergyWh: n,
    restVoltageV: n,
    minCellVoltageV: n,
    cellSpreadV: n,
    sampleIntervalS: n,
    discharges: z.array(discharge),
    headlineDischarge: z.number().int().nullable(),
    retention: retention.nullable(),
    dischargeCurrentSign: z.enum(["positive", "negative"]),
    cellsSource: z.enum(["given", "cell-columns", "rest-voltage"]).nullable(),
    warnings: z.array(z.string()),
    warningCodes: z.array(z.enum(WARNING_CODES)),
    parameters: z.object({
      holdDelayS: z.number(),
      stopTemperatureC: z.number(),
      activationEnergyKJPerMol: z.number(),
      nominalVPerCell: z.number(),
      floorVPerCell: z.number(),
      loadThresholdA: z.number(),
    }),
    curve: z.array(curvePoint).optional().describe("Only with include=curve."),
  })
  .describe("Figures of the log, as the open CLI's --json prints them (full precision), and the parameters used.");

// The schema and lib/analysis's types must describe the same object (a compile-time check).
type Same<A, B> = [A] extends [B] ? ([B] extends [A] ? true : false) : false;
const _sameShape: Same<z.infer<typeof analyseResponse>, PublicFigures & { curve?: CurvePoint[] }> = true;
void _sameShape;

export const oembedResponse = z.object({
  version: z.literal("1.0"),
  type: z.literal("rich"),
  title: z.string(),
  author_name: z.string(),
  author_url: z.string(),
  provider_name: z.string(),
  provider_url: z.string(),
  cache_age: z.number().int(),
  html: z.string(),
  width: z.number().int(),
  height: z.number().int(),
  thumbnail_url: z.string().optional(),
  thumbnail_width: z.number().int().optional(),
  thumbnail_height: z.number().int().optional(),
  license: z.string().describe("SPDX identifier of the data's licence."),
  license_url: z.string(),
});

export const flagCreated = z.object({
  flag: z.object({ id: z.number().int(), resultId: z.number().int(), status: z.literal("open") }),
});

export const meResponse = z.object({
  user: z.object({ name: z.string(), role: z.enum(userRoles) }).nullable(),
  watching: z.boolean().optional(),
});

/** GET /data/datapackage.json: a Data Package v2 descriptor (its full rules: the Frictionless profiles). */
export const dataPackageResponse = z
  .looseObject({
    $schema: z.string(),
    name: z.string(),
    version: z.string(),
    licenses: z.array(z.looseObject({ name: z.string(), path: z.string() })).min(1),
    resources: z.array(
      z.looseObject({
        name: z.string(),
        path: z.string(),
        schema: z.looseObject({ fields: z.array(z.looseObject({})) }),
      }),
    ),
  })
  .describe("A Data Package (v2) descriptor: https://datapackage.org/standard/data-package/");

/** GET /api/v1/openapi.json: an OpenAPI 3.1 document (its full rules: the OpenAPI specification). */
export const openApiResponse = z
  .looseObject({
    openapi: z.string(),
    info: z.looseObject({ title: z.string(), version: z.string() }),
    paths: z.looseObject({}),
  })
  .describe("An OpenAPI 3.1 document: https://spec.openapis.org/oas/v3.1.0");
