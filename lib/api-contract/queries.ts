// One zod schema per public query: the API's route handlers, the /packs page (leniently, lib/pack-query-params.ts),
// the downloads and the tests parse with these, and the OpenAPI document's parameters are generated from them.
import { z } from "zod";
import { groupKey, packFilterShape, pageShape, rowId, slug, withRanges } from "./params";

export const PACK_SORT_KEYS = [
  "maker",
  "model",
  "cells",
  "capacity",
  "labelledC",
  "weight",
  "connector",
  "results",
  "measuredC",
  "labelRatio",
  "capacityRatio",
] as const;
export type PackSortKey = (typeof PACK_SORT_KEYS)[number];

const groupFilter = groupKey
  .optional()
  .describe("Like-for-like group key (GET /api/v1/groups lists them). An unknown group answers 404.");
const packFilter = slug.optional().describe("Pack slug.");

const packFilters = z.object(packFilterShape);
export type PackFilters = z.infer<typeof packFilters>;

/** GET /api/v1/packs and the /packs page. */
export const packListShape = {
  ...packFilterShape,
  group: groupFilter.describe(
    "Like-for-like group key: only packs with published results in it, with their medians there (measuredC, labelRatio, capacityRatio). An unknown group answers 404.",
  ),
  sort: z
    .enum(PACK_SORT_KEYS)
    .default("maker")
    .describe("Column to sort by. With q and the default sort, best match first."),
  dir: z.enum(["asc", "desc"]).default("asc").describe("Sort direction; missing values sort last either way."),
  ...pageShape,
};
export const packListQuery = withRanges(z.object(packListShape));

/**
 * GET /api/v1/results reads numbered pages only this far (OFFSET grows with the page number); later results are
 * read by key, `after=<id>`, which links.next always uses.
 */
export const RESULT_PAGE_CAP = 20;

/** GET /api/v1/results: numbered pages up to RESULT_PAGE_CAP, or pages by key (`after`); not both. */
export const resultListQuery = withRanges(
  z.object({
    ...packFilterShape,
    pack: packFilter,
    group: groupFilter,
    page: z.coerce
      .number()
      .int("page must be a whole number.")
      .min(1, "page starts at 1.")
      .max(
        RESULT_PAGE_CAP,
        `page goes up to ${RESULT_PAGE_CAP}; for later results use after=<id of the last result you have> (links.next gives it).`,
      )
      .optional()
      .describe(
        `Page number, 1–${RESULT_PAGE_CAP} (default 1), with an exact total. A page past the last answers 422; for later results use after.`,
      ),
    size: pageShape.size,
    after: rowId
      .optional()
      .describe(
        "Results with an id above this one, in id order (paging by key; links.next gives it). The total is then PostgreSQL's planner estimate (meta.totalIsEstimate).",
      ),
  }),
).refine((v) => v.page === undefined || v.after === undefined, {
  path: ["after"],
  message: "Use page or after, not both.",
});
export type ResultFilters = Omit<z.infer<typeof resultListQuery>, "page" | "size" | "after">;

/** GET /api/v1/makers. */
export const pageQuery = z.object(pageShape);

/** GET /api/v1/charts: the featured charts, 20 a page by default and at most 50. */
export const chartListQuery = z.object({
  page: pageShape.page,
  size: z.coerce
    .number()
    .int("size must be a whole number.")
    .min(1, "size must be at least 1.")
    .max(50, "size must be at most 50.")
    .default(20)
    .describe("Charts per page."),
});

/** GET /api/v1/groups. */
export const groupListQuery = z.object({
  ...pageShape,
  minResults: z.coerce
    .number()
    .int()
    .min(1)
    .max(1000)
    .default(1)
    .describe("Only groups with at least this many published results."),
});

/** GET /api/v1/groups/{key}: the pack filters narrow the packs compared. */
export const groupQuery = withRanges(packFilters);

/** The reader's units for CSV downloads (lib/units.ts); JSON files and the API stay SI. */
const unitsParam = z
  .string()
  .regex(
    /^(C|F|g|oz|cell|pack)(,(C|F|g|oz|cell|pack))*$/,
    "units takes C or F, g or oz, cell or pack, comma-separated.",
  )
  .optional()
  .describe(
    "CSV only: the reader's units, e.g. F,oz,pack (°F, ounces, per-pack voltages and resistances); each converted column is named with its unit. JSON files and the API stay SI.",
  );

/** GET /data/download/{file}: the pack filters; results also by pack and group; CSV in the reader's units. */
export const downloadQuery = withRanges(
  z.object({ ...packFilterShape, pack: packFilter, group: groupFilter, units: unitsParam }),
);

const DOWNLOAD_FILES = [
  "makers.csv",
  "makers.json",
  "packs.csv",
  "packs.json",
  "results.csv",
  "results.json",
  "README.txt",
] as const;
export const downloadPath = z.object({
  file: z.enum(DOWNLOAD_FILES, { error: "Ask for makers, packs or results as .csv or .json, or README.txt." }),
});

export const slugPath = z.object({ slug });
export const idPath = z.object({ id: rowId });
export const groupPath = z.object({ key: groupKey });
export const chartIdPath = z.object({ id: z.string().regex(/^[a-z0-9-]{1,64}$/, "Not a chart id.") });
