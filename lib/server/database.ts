import "server-only";
import type { Pool } from "pg";
import { createDatabase, type Database } from "@/db/client";
import { getEnv } from "@/lib/env";

// One pool per server process. Kept on globalThis so that dev-mode module reloads do not
// open a new pool on every edit.
const holder = globalThis as unknown as { ionleafDb?: { db: Database; pool: Pool } };

export function getDb(): Database {
  if (!holder.ionleafDb) holder.ionleafDb = createDatabase(getEnv().DATABASE_URL);
  return holder.ionleafDb.db;
}

/** For scripts (seed): close the pool so the process can exit. */
export async function closeDb(): Promise<void> {
  const held = holder.ionleafDb;
  holder.ionleafDb = undefined;
  if (held) await held.pool.end();
}
