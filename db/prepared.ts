import { createHash } from "node:crypto";
import type { SQL } from "drizzle-orm";
import { PgDialect } from "drizzle-orm/pg-core";
import type { Pool, QueryResultRow } from "pg";
import type { Executor } from "./client";

const dialect = new PgDialect();

/**
 * Runs a statement as a named prepared statement, so that each pooled connection parses it
 * once and PostgreSQL's plan cache may keep a generic plan for it instead of planning it for
 * every call. The name is a hash of the statement's text: one text, one name, whatever the
 * parameter values. Only for statements whose best plan does not depend on their values
 * (the caller says why); in a transaction, which has no pool of its own, it runs as usual.
 *
 * Rows come back as node-postgres types them (a timestamptz as a Date), not as Drizzle's
 * db.execute would (as text).
 */
export async function executePrepared<T extends QueryResultRow>(
  db: Executor,
  statement: SQL,
): Promise<T[]> {
  // drizzle(pool) exposes its pool as $client; a transaction has none (its type does not say so).
  const pool = (db as { $client?: Pool }).$client;
  if (!pool) return (await db.execute<T>(statement)).rows as T[];
  const query = dialect.sqlToQuery(statement);
  const name = `p_${createHash("sha1").update(query.sql).digest("base64url").slice(0, 20)}`;
  const result = await pool.query<T>({ name, text: query.sql, values: query.params });
  return result.rows;
}
