// The one counting rule, as one SQL predicate (its words: PUBLISHED_RULE in lib/open-data/licence.ts): a result
// is published when it is approved and its pack and maker are active catalogue entries. Every reader of published
// results — home chart, maker ranking, /packs, pack pages, /compare, charts and embeds, the API, the downloads, the
// sitemap, result pages — filters with it, so they all count the same results. A result with an open reader case
// stays approved and so still counts. The predicate names results, packs and makers: join packs on
// results.pack_id and makers on packs.maker_id (packOfResult, makerOfPack).
import "server-only";
import { and, eq, inArray } from "drizzle-orm";
import { makers, packs, results, type ReviewStatus } from "@/db/schema";

/**
 * "approved" is published. Until the reader-case work of issue 13 lands, an open reader case is still stored as
 * the status "disputed" — the same thing as "approved with an open case", so it counts too. That work drops
 * "disputed" from the enum; this entry goes with it (the type makes it a compile error until it does).
 */
const PUBLISHED_STATUSES: ReviewStatus[] = ["approved", "disputed"];

export const isPublished = and(
  inArray(results.status, PUBLISHED_STATUSES),
  eq(packs.status, "active"),
  eq(makers.status, "active"),
);

export const packOfResult = eq(packs.id, results.packId);
export const makerOfPack = eq(makers.id, packs.makerId);
