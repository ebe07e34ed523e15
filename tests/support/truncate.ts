import { sql } from "drizzle-orm";
import type { Database } from "@/db/client";

/** Empties every application table (test databases only). TRUNCATE bypasses row triggers by design. */
export async function truncateAll(db: Database): Promise<void> {
  const rows = await db.execute<{ tablename: string }>(
    sql`select tablename from pg_tables where schemaname = 'public'`,
  );
  const names = rows.rows.map((r) => `"${r.tablename}"`).join(", ");
  if (names) await db.execute(sql.raw(`truncate table ${names} restart identity cascade`));
}
