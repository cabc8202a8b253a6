// One zod schema per public response. Every list is { data, meta, links } (meta: page, size, total, pageCount
// and the licence; links: self, first, last, next, prev); every single item is { data, meta, links } too. The
// route handlers check what they send against these outside production (server/api.ts), the OpenAPI document
// is generated from them (./openapi.ts), and the tests validate real answers against that document.
import { z } from "zod";
import { AGGREGATE_FIGURES } from "@/lib/open-data/aggregate";
import { CHART_KINDS } from "@/lib/open-data/chart-state";
import { DATA_LICENCE_LABEL, DATA_LICENCE_SPDX } from "@/lib/open-data/licence";
import { PACK_SORT_KEYS, RESULT_PAGE_CAP } from "./queries";
import { makerRecord, packRecord, resultRecord } from "./records";

export const licenceSchema = z
  .object({
    identifier: z.literal(DATA_LICENCE_SPDX).describe("SPDX licence identifier."),
    name: z.literal(DATA_LICENCE_LABEL),
    title: z.string(),
    url: z.url(),
    attribution: z.string().describe("How to credit Sagline."),
  })
  .describe("The data's licence and how to credit it.");

const filterValue = z.union([z.string(), z.number()]);
export const listMeta = z
  .object({
    page: z.number().int().min(1),
    size: z.number().int().min(1),
    total: z.number().int().min(0).describe("Items in the whole list (also in the X-Total-Count header)."),
    pageCount: z.number().int().min(1),
    filters: z.record(z.string(), filterValue).optional().describe("The filters applied, as understood."),
    sort: z.enum(PACK_SORT_KEYS).optional(),
    dir: z.enum(["asc", "desc"]).optional(),
    licence: licenceSchema,
  })
  .describe("Where this page sits in the list, and the licence.");
export const listLinks = z
  .object({
    self: z.string(),
    first: z.string(),
    last: z.string(),
    next: z.string().nullable(),
    prev: z.string().nullable(),
  })
  .describe("Paths of this page and its neighbours (null past either end).");
const itemMeta = z.object({ licence: licenceSchema, aggregate: z.string().optional() });
const itemLinks = z.record(z.string(), z.string()).describe("Related paths.");

const listOf = <T extends z.ZodType>(item: T) => z.object({ data: z.array(item), meta: listMeta, links: listLinks });
const itemOf = <T extends z.ZodType>(item: T) => z.object({ data: item, meta: itemMeta, links: itemLinks });

/** A row of GET /api/v1/packs: the pack, and its figures in the chosen like-for-like group. */
export const packListItem = packRecord
  .extend({
    groupCount: z.number().int().min(0).describe("Like-for-like groups the pack has published results in."),
    groupN: z.number().int().min(0).describe("Published results in the chosen group (0 without a group)."),
    measuredC: z.number().nullable().describe("Median sag-limited C in the chosen group, in C (1 decimal)."),
    labelRatio: z.number().nullable().describe("Median label ratio in the chosen group (3 decimals)."),
    capacityRatio: z.number().nullable().describe("Median capacity ratio in the chosen group (3 decimals)."),
  })
  .describe("A pack as the packs table shows it.");

export const groupSummary = z
  .object({
    key: z.string(),
    label: z.string(),
    resultCount: z.number().int().min(0),
    packCount: z.number().int().min(0),
    links: z.object({ self: z.string() }),
  })
  .describe("A like-for-like group with its numbers of published results and packs.");

const figureSummary = z
  .object({ median: z.number(), n: z.number().int().min(1), min: z.number(), max: z.number() })
  .nullable()
  .describe("Median of the pack's published results with n, min and max; null without values.");
export const packAggregate = z.object({
  packSlug: z.string(),
  makerSlug: z.string(),
  makerName: z.string(),
  model: z.string(),
  cellsInSeries: z.number().int(),
  ratedCapacityMah: z.number().int(),
  labelledContinuousC: z.number(),
  resultCount: z.number().int().min(1),
  figures: z.object(Object.fromEntries(AGGREGATE_FIGURES.map((f) => [f, figureSummary]))),
});
export const groupDetail = z.object({
  key: z.string(),
  label: z.string().nullable(),
  resultCount: z.number().int().min(0),
  packCount: z.number().int().min(0),
  packs: z.array(packAggregate),
});

const chartLinks = z.object({ permalink: z.string(), embed: z.string(), svg: z.string(), png: z.string() });
export const savedChart = z.object({
  id: z.string(),
  kind: z.enum(CHART_KINDS),
  title: z.string(),
  note: z.string().nullable(),
  createdAt: z.iso.datetime({ offset: true }),
  featuredAt: z.iso
    .datetime({ offset: true })
    .nullable()
    .describe("When a moderator featured the chart on /charts; null for a chart only its link reaches."),
  state: z.record(z.string(), z.unknown()).describe("The chart's full state (version, kind, group, filters, title)."),
  links: chartLinks.nullable().describe("null when the stored state no longer reads as a chart."),
});

export const makerList = listOf(makerRecord);
export const makerItem = itemOf(makerRecord);
export const packList = listOf(packListItem);
export const packItem = itemOf(packRecord);
/**
 * GET /api/v1/results pages by number (exact total) or by key (`after`: the total is PostgreSQL's planner estimate,
 * and there is no page number, page count, last or previous page). links.next always reads by key.
 */
export const resultList = z.object({
  data: z.array(resultRecord),
  meta: listMeta.extend({
    page: listMeta.shape.page.optional().describe("Page number (absent when paging by key)."),
    pageCount: listMeta.shape.pageCount.optional().describe("Pages of this size (absent when paging by key)."),
    total: z
      .number()
      .int()
      .min(0)
      .describe(
        "Results in the whole list: exact with page (also in X-Total-Count), PostgreSQL's planner estimate with after.",
      ),
    totalIsEstimate: z
      .boolean()
      .describe("true when total is the planner's estimate (paging by key), false when it is an exact count."),
    after: z.number().int().min(1).optional().describe("The id this page starts after (paging by key)."),
  }),
  links: listLinks.extend({
    last: z
      .string()
      .nullable()
      .describe(`The last numbered page; null when paging by key or when it lies past page ${RESULT_PAGE_CAP}.`),
    next: z.string().nullable().describe("The next page, by key (after=<last id of this page>); null at the end."),
  }),
});
export const resultItem = itemOf(resultRecord);
export const groupList = listOf(groupSummary);
export const groupItem = itemOf(groupDetail);
export const chartList = listOf(savedChart);
export const chartItem = itemOf(savedChart);

/** The JSON downloads: the same records, the whole (filtered) list, with the licence. */
const downloadMeta = z.object({
  dataset: z.enum(["makers", "packs", "results"]),
  schemaVersion: z.string(),
  total: z.number().int().min(0),
  filters: z.record(z.string(), filterValue),
  licence: licenceSchema,
});
const downloadLinks = z.object({ describedby: z.string(), readme: z.string(), license: z.string() });
export const makerDownload = z.object({ data: z.array(makerRecord), meta: downloadMeta, links: downloadLinks });
export const packDownload = z.object({ data: z.array(packRecord), meta: downloadMeta, links: downloadLinks });
export const resultDownload = z.object({ data: z.array(resultRecord), meta: downloadMeta, links: downloadLinks });
export const downloadBody = z.union([makerDownload, packDownload, resultDownload]);

export const errorBody = z
  .object({
    error: z.object({
      code: z.string(),
      message: z.string(),
      fieldErrors: z.record(z.string(), z.array(z.string())).optional(),
    }),
  })
  .describe("What went wrong; fieldErrors names each bad parameter.");
