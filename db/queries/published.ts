// The one counting rule, as one SQL predicate (its words: PUBLISHED_RULE in lib/open-data/licence.ts): a result
// is published when it is approved and its pack and maker are active catalogue entries. Every reader of published
// results — home chart, maker ranking, /packs, pack pages, /compare, charts and embeds, the API, the downloads, the
// sitemap — filters with it, so they all count the same results. A result with an open reader case stays approved
// and so still counts. The predicate names results, packs and makers: join packs on results.pack_id and makers on
// packs.maker_id (publishedResults() does).
import "server-only";
import { eq, sql } from "drizzle-orm";
import { makers, packs, results } from "@/db/schema";

const PUBLISHED_STATUS = "approved" as const;

export const isPublished = sql`(${results.status} = ${PUBLISHED_STATUS} and ${packs.status} = 'active' and ${makers.status} = 'active')`;

/** results ⋈ packs ⋈ makers, for selects that filter with isPublished. */
export const packOfResult = eq(packs.id, results.packId);
export const makerOfPack = eq(makers.id, packs.makerId);
