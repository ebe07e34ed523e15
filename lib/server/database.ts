import "server-only";
import { createDatabase, type Database } from "@/db/client";
import { getEnv } from "@/lib/env";

// One pool per server process. Kept on globalThis so that dev-mode module reloads do not
// open a new pool on every edit.
const holder = globalThis as unknown as { ionleafDb?: Database };

export function getDb(): Database {
  if (!holder.ionleafDb) holder.ionleafDb = createDatabase(getEnv().DATABASE_URL).db;
  return holder.ionleafDb;
}
