// The pack search in PostgreSQL (pg_trgm): which active packs match every word of the reader's text (lib/pack-search.ts
// says how a word matches). Each word takes its matches from the two trigram indexes (makers_name_trgm_idx,
// packs_model_trgm_idx), and a pack is found only when every word matches it — so words matching two different
// packs find neither. The condition runs inside `searchTx`, which sets pg_trgm's threshold for its transaction.
import "server-only";
import { sql, type SQL } from "drizzle-orm";
import { db, type Executor } from "@/db";
import { searchWords, STRICT_WORD_SIMILARITY, type SearchWord } from "@/lib/pack-search";

/** How one word matches one lower-cased text column (the expression the trigram index is built on). */
function wordMatches(w: SearchWord, column: SQL): SQL {
  switch (w.kind) {
    case "number":
      return sql`${column} ~ ${w.regex}`;
    case "exact":
      return sql`${column} like ${w.like}`;
    case "fuzzy":
      // <<% : strict word similarity of the word to a whole word of the column at least the threshold searchTx sets.
      return sql`(${column} like ${w.like} or ${w.text} <<% ${column})`;
  }
}

/** The ids of packs (any status) whose maker or model matches the word. */
const packsMatching = (w: SearchWord): SQL =>
  sql`(select sp.id from packs sp where ${wordMatches(w, sql`lower(sp.model)`)}
    union
    select sp.id from makers sm join packs sp on sp.maker_id = sm.id where ${wordMatches(w, sql`lower(sm.name)`)})`;

/**
 * The condition "the pack matches every word of `q`" on `packId` (a pack id column), or null when `q` holds no
 * word (no search: every pack). Must run inside `searchTx` (the fuzzy words need its threshold).
 */
export function searchCondition(q: string, packId: SQL): SQL | null {
  const words = searchWords(q);
  if (words.length === 0) return null;
  return sql.join(
    words.map((w) => sql`${packId} in ${packsMatching(w)}`),
    sql` and `,
  );
}

/**
 * Runs `run` for a search of `q`: in a read-only transaction with pg_trgm's strict word similarity threshold
 * (lib/pack-search.ts) set for it only when `q` holds a word, straight on the pool when it holds none.
 */
export function searchTx<T>(q: string, run: (ex: Executor) => Promise<T>): Promise<T> {
  if (searchWords(q).length === 0) return run(db);
  return db.transaction(
    async (tx) => {
      await tx.execute(
        sql`select set_config('pg_trgm.strict_word_similarity_threshold', ${String(STRICT_WORD_SIMILARITY)}, true)`,
      );
      return run(tx);
    },
    { accessMode: "read only" },
  );
}

/**
 * The active packs of active makers matching every word of `q`, or null when `q` holds no word (no search: every
 * pack). The order is the database's.
 */
export async function searchPackIds(q: string): Promise<Set<number> | null> {
  const cond = searchCondition(q, sql`p.id`);
  if (cond === null) return null;
  return searchTx(q, async (tx) => {
    const found = await tx.execute<{ id: number }>(sql`select p.id from packs p join makers m on m.id = p.maker_id
        where p.status = 'active' and m.status = 'active' and ${cond}`);
    return new Set(found.rows.map((r) => r.id));
  });
}
