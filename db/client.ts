import { drizzle, type NodePgDatabase } from "drizzle-orm/node-postgres";
import { Pool } from "pg";
import * as schema from "./schema";

export type Database = NodePgDatabase<typeof schema>;
/** A database handle or an open transaction: data-access functions accept either. */
export type Executor = Database | Parameters<Parameters<Database["transaction"]>[0]>[0];

export function createDatabase(
  connectionString: string,
  maxConnections = 10,
): { db: Database; pool: Pool } {
  const pool = new Pool({ connectionString, max: maxConnections });
  return { db: drizzle(pool, { schema }), pool };
}
