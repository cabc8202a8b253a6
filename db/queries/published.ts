// The one counting rule, as one SQL predicate (its words: PUBLISHED_RULE in lib/open-data/licence.ts): a result
// is published when it is approved and its pack and maker are active catalogue entries. Every reader of published
// results — home chart, maker ranking, /packs, pack pages, /compare, charts and embeds, the API, the downloads, the
// sitemap, result pages — filters with it, so they all count the same results. A result with an open reader case
// stays approved and so still counts. The predicate names results, packs and makers: join packs on
// results.pack_id and makers on packs.maker_id (packOfResult, makerOfPack).
import "server-only";
import { and, eq } from "drizzle-orm";
import { makers, packs, results } from "@/db/schema";

/** The rule's catalogue half: the pack and its maker are active. Readers of the summary tables (which count
 * approved results whatever the pack's or maker's status) join packs and makers and filter with it. */
export const isCatalogueActive = and(eq(packs.status, "active"), eq(makers.status, "active"));

export const isPublished = and(eq(results.status, "approved"), isCatalogueActive);

export const packOfResult = eq(packs.id, results.packId);
export const makerOfPack = eq(makers.id, packs.makerId);
