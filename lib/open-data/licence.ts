// The data licence and how to credit Sagline: stated on /data, in the Data Package descriptor, in every
// download's header note, in API responses and inside every chart.
export const DATA_LICENCE_NAME = "CC-BY-4.0";
export const DATA_LICENCE_TITLE = "Creative Commons Attribution 4.0 International";
export const DATA_LICENCE_SHORT = "CC BY 4.0";
export const DATA_LICENCE_URL = "https://creativecommons.org/licenses/by/4.0/";
export const ATTRIBUTION = "Sagline contributors";
export const ATTRIBUTION_TEXT = `Data: ${ATTRIBUTION}, Sagline open data, licensed ${DATA_LICENCE_SHORT} (${DATA_LICENCE_URL}).`;
/** Semantic version of the published data schema (fields, types, units). Bump major on breaking changes. */
export const DATA_SCHEMA_VERSION = "1.0.0";

export const licenceInfo = {
  name: DATA_LICENCE_NAME,
  title: DATA_LICENCE_TITLE,
  url: DATA_LICENCE_URL,
  attribution: ATTRIBUTION_TEXT,
} as const;
