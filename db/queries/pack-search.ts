// The pack search in PostgreSQL (pg_trgm): the ids of the active packs whose maker's name or model matches every
// word of the reader's text (lib/pack-search.ts says how a word matches). Each word takes its matches from the
// two trigram indexes (makers_name_trgm_idx, packs_model_trgm_idx), and a pack is found only when every word
// matches it — so words matching two different packs find neither.
import "server-only";
import { sql, type SQL } from "drizzle-orm";
import { db } from "@/db";
import { searchWords, STRICT_WORD_SIMILARITY, type SearchWord } from "@/lib/pack-search";

/** How one word matches one lower-cased text column (the expression the trigram index is built on). */
function wordMatches(w: SearchWord, column: SQL): SQL {
  switch (w.kind) {
    case "number":
      return sql`${column} ~ ${w.regex}`;
    case "exact":
      return sql`${column} like ${w.like}`;
    case "fuzzy":
      // <<% : strict word similarity of the word to a whole word of the column at least the threshold set below.
      return sql`(${column} like ${w.like} or ${w.text} <<% ${column})`;
  }
}

/** The ids of packs (any status) whose maker or model matches the word. */
const packsMatching = (w: SearchWord): SQL =>
  sql`(select p.id from packs p where ${wordMatches(w, sql`lower(p.model)`)}
    union
    select p.id from makers m join packs p on p.maker_id = m.id where ${wordMatches(w, sql`lower(m.name)`)})`;

/**
 * The active packs of active makers matching every word of `q`, or null when `q` holds no word (no search: every
 * pack). The order is the database's; the caller ranks them (lib/pack-query.ts, Fuse.js).
 */
export async function searchPackIds(q: string): Promise<Set<number> | null> {
  const words = searchWords(q);
  if (words.length === 0) return null;
  const everyWord = sql.join(
    words.map((w) => sql`p.id in ${packsMatching(w)}`),
    sql` and `,
  );
  return db.transaction(
    async (tx) => {
      // The threshold for <<% in this transaction only (pg_trgm's setting, stated in lib/pack-search.ts).
      await tx.execute(
        sql`select set_config('pg_trgm.strict_word_similarity_threshold', ${String(STRICT_WORD_SIMILARITY)}, true)`,
      );
      const found = await tx.execute<{ id: number }>(sql`select p.id from packs p join makers m on m.id = p.maker_id
        where p.status = 'active' and m.status = 'active' and ${everyWord}`);
      return new Set(found.rows.map((r) => r.id));
    },
    { accessMode: "read only" },
  );
}
