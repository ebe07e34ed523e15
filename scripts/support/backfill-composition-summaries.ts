/**
 * Fills solution_results.composition_summary (drizzle/0011) for the rows saved before the
 * column existed, from what each row already holds: the typed components of its inputs and,
 * for a solution made from stocks, the components its stocks contributed (results.dilution),
 * through the same compositionSummary the save path uses. Run by runMigrations after the SQL
 * migrations, as the owner of the tables; a no-op (one probe of an empty partial index) once
 * every row has its summary.
 *
 * Stored results are immutable (trigger solution_results_immutable). The backfill turns that
 * trigger off inside its own transaction, sets nothing but the new column of rows where it is
 * null, and turns it back on before committing; ALTER TABLE is transactional, so a crash
 * anywhere leaves the trigger on and the rows as they were.
 */
import type { Pool, PoolClient } from "pg";
import { compositionSummary } from "@/lib/document/composition-summary";

const BATCH = 5_000;

/** A JSON value as a list of components (a row without any has null). */
const list = (x: unknown): unknown[] => (Array.isArray(x) ? (x as unknown[]) : []);

interface PendingRow {
  id: string;
  components: unknown;
  diluted: unknown;
}

async function hasColumn(client: PoolClient): Promise<boolean> {
  const { rows } = await client.query(
    `select 1 from information_schema.columns
      where table_schema = current_schema() and table_name = 'solution_results'
        and column_name = 'composition_summary'`,
  );
  return rows.length === 1;
}

/** Fills every missing summary; returns how many rows it filled. */
export async function backfillCompositionSummaries(pool: Pool): Promise<number> {
  const client = await pool.connect();
  try {
    // A database migrated only part of the way (tests do that) has no column to fill yet.
    if (!(await hasColumn(client))) return 0;
    const pending = await client.query(
      `select 1 from solution_results where composition_summary is null limit 1`,
    );
    if (pending.rows.length === 0) return 0;

    await client.query("begin");
    await client.query("alter table solution_results disable trigger solution_results_immutable");
    let filled = 0;
    let after = "00000000-0000-0000-0000-000000000000";
    for (;;) {
      const { rows } = await client.query<PendingRow>(
        `select id, inputs -> 'components' as components,
                results -> 'dilution' -> 'components' as diluted
           from solution_results
          where composition_summary is null and id > $1
          order by id limit ${BATCH}`,
        [after],
      );
      if (rows.length === 0) break;
      const summaries = rows.map((r) =>
        compositionSummary([...list(r.components), ...list(r.diluted)]),
      );
      await client.query(
        `update solution_results s set composition_summary = v.summary
           from unnest($1::uuid[], $2::text[]) as v(id, summary)
          where s.id = v.id and s.composition_summary is null`,
        [rows.map((r) => r.id), summaries],
      );
      filled += rows.length;
      after = rows[rows.length - 1].id;
    }
    await client.query("alter table solution_results enable trigger solution_results_immutable");
    await client.query("commit");
    return filled;
  } catch (error) {
    await client.query("rollback").catch(() => undefined);
    throw error;
  } finally {
    client.release();
  }
}
