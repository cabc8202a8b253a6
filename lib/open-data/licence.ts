// The data licence, how to credit Sagline, and which results count: stated once here and shown on /data and
// /methods, in the Data Package descriptor and README, in every API answer's meta.licence and inside every chart.
// One licence identifier (SPDX) for machines, one spelling for people.
export const DATA_LICENCE_SPDX = "CC-BY-4.0";
export const DATA_LICENCE_LABEL = "CC BY 4.0";
export const DATA_LICENCE_TITLE = "Creative Commons Attribution 4.0 International";
export const DATA_LICENCE_URL = "https://creativecommons.org/licenses/by/4.0/";
export const ATTRIBUTION = "Sagline contributors";
export const ATTRIBUTION_TEXT = `Data: ${ATTRIBUTION}, Sagline open data, licensed ${DATA_LICENCE_LABEL} (${DATA_LICENCE_URL}).`;
/**
 * Semantic version of the published data schema (fields, types, units, file format). Bump major on breaking
 * changes. 2.0.0: strict CSV without comment lines, figures rounded to their digits, maker result counts,
 * maker slug and name on packs, `resultCount` for the published-result counts, one list shape. 2.1.0: results gain
 * the measured rating (sustainedCMeasured, sustainedLabelRatio); sagLimitedC and labelRatio are described as the
 * estimate they are. 2.2.0: every headline figure gains `<figure>U95`, its expanded uncertainty (k = 2).
 */
export const DATA_SCHEMA_VERSION = "2.2.0";

/** meta.licence of every API answer and JSON download. */
export const licenceInfo = {
  identifier: DATA_LICENCE_SPDX,
  name: DATA_LICENCE_LABEL,
  title: DATA_LICENCE_TITLE,
  url: DATA_LICENCE_URL,
  attribution: ATTRIBUTION_TEXT,
} as const;

/**
 * The one counting rule (db/queries/published.ts implements it as one SQL predicate; every page, chart, API
 * answer and download reads published results through it).
 */
export const PUBLISHED_RULE =
  "A result counts as published when a moderator has approved it and its pack and maker are in the catalogue. " +
  "Every page, chart, API answer and download counts exactly these results. A result with an open reader case " +
  "still counts and is shown with a note until a moderator resolves the case; pending, rejected and withdrawn " +
  "results never count.";
