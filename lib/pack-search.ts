// The pack search's rule, as data: a reader's text becomes words, and each word says how it must match the
// maker's name or the pack's model (db/queries/pack-search.ts turns these into SQL with pg_trgm). Every word
// must match the maker or the model of the same pack; a typo is forgiven within a word, never across words.

/** Words of this many letters or more may match with a typo; shorter ones must appear as typed. */
export const FUZZY_MIN_LETTERS = 4;
/**
 * pg_trgm's strict word similarity a word needs to count as a typo of a whole word of the maker's name or model:
 * the trigrams the two share over the trigrams either has (PostgreSQL 15 documentation, F.35 pg_trgm; its
 * default threshold is 0.5). One letter left out of a 6-letter word scores 4/9 = 0.44 ("dunin"/"dunlin"), one
 * letter changed 4/10 = 0.4, so 0.5 would forgive typos only in long words; "brakwater"/"brackwater" scores
 * 8/13, "kestrl"/"kestrel" 5/10. Chosen on the demo catalogue: at 0.4, none of 125 queries (each word, each
 * word of 6+ letters with a letter left out, each maker with a model word) found a pack the earlier whole-text
 * Fuse.js search (threshold 0.4) did not.
 */
export const STRICT_WORD_SIMILARITY = 0.4;
/** More words than this are not searched (the rest of the text is ignored). */
export const MAX_SEARCH_WORDS = 8;

export type SearchWord =
  /** Letters only, long enough for a typo: a substring of maker or model, or a word of them with a typo. */
  | { kind: "fuzzy"; text: string; like: string }
  /** Letters only and short: a substring of maker or model, as typed. */
  | { kind: "exact"; text: string; like: string }
  /** Holds a digit ("1300", "4s"): as typed, and a number never as part of a longer number ("1300" ≠ "11300"). */
  | { kind: "number"; text: string; regex: string };

/** The reader's text as search words: lower-cased, split at anything but letters and digits, each word once. */
export function searchWords(q: string): SearchWord[] {
  const words = [...new Set(q.toLowerCase().split(/[^\p{L}\p{N}]+/u))].filter((w) => w !== "");
  return words.slice(0, MAX_SEARCH_WORDS).map((text): SearchWord => {
    if (/\d/.test(text)) {
      // The word holds letters and digits only, so it needs no escaping inside a regular expression.
      const before = /^\d/.test(text) ? "(^|[^0-9])" : "";
      const after = /\d$/.test(text) ? "([^0-9]|$)" : "";
      return { kind: "number", text, regex: `${before}${text}${after}` };
    }
    // Letters only: LIKE's wildcards (% _ \) cannot occur in the word.
    const like = `%${text}%`;
    return [...text].length >= FUZZY_MIN_LETTERS ? { kind: "fuzzy", text, like } : { kind: "exact", text, like };
  });
}
