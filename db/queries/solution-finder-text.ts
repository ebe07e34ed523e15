import { sql, type SQL } from "drizzle-orm";

/**
 * Full-text search of a revision's title and text. The expression must be written exactly as
 * the index `revisions_search_idx` (db/schema/notebook.ts) declares it, or PostgreSQL cannot
 * use the index: English stemming over `title || ' ' || content_text`.
 */
export function revisionMatches(alias: string, tsquery: string): SQL {
  const r = sql.raw(alias);
  return sql`to_tsvector('english', ${r}.title || ' ' || ${r}.content_text) @@ to_tsquery('english', ${tsquery})`;
}

/**
 * A user's words as a tsquery where every word is a prefix ("electrolyt" finds
 * "electrolyte" and "electrolytes"): letters and digits only, each quoted, joined by AND.
 * Null when nothing searchable is left.
 */
export function prefixTsquery(text: string): string | null {
  const words = text.toLowerCase().match(/[\p{L}\p{N}]+/gu) ?? [];
  const unique = [...new Set(words)].slice(0, 12);
  return unique.length ? unique.map((w) => `'${w}':*`).join(" & ") : null;
}
