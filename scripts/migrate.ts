/**
 * Applies the committed drizzle-kit migrations (drizzle/) to DATABASE_URL.
 * Run by `npm start` and `npm test` before anything touches the database.
 */
import { drizzle } from "drizzle-orm/node-postgres";
import { migrate } from "drizzle-orm/node-postgres/migrator";
import { Pool } from "pg";

export const MIGRATIONS_FOLDER = new URL("../drizzle", import.meta.url).pathname;

export async function runMigrations(
  databaseUrl: string,
  migrationsFolder = MIGRATIONS_FOLDER,
): Promise<void> {
  const pool = new Pool({ connectionString: databaseUrl, max: 1 });
  try {
    await migrate(drizzle(pool), { migrationsFolder });
  } finally {
    await pool.end();
  }
}

const isMain = process.argv[1] && new URL(import.meta.url).pathname === process.argv[1];
if (isMain) {
  const url = process.env.DATABASE_URL;
  if (!url) {
    console.error("DATABASE_URL is not set");
    process.exit(1);
  }
  runMigrations(url)
    .then(() => console.log("[ionleaf] migrations applied"))
    .catch((error: unknown) => {
      console.error("[ionleaf] migration failed:", error instanceof Error ? error.message : error);
      process.exit(1);
    });
}
