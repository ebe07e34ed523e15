/**
 * Applies the committed drizzle-kit migrations (drizzle/), the data backfills that SQL cannot
 * compute, and the application role's privileges. Run by `npm start` and `npm test` before
 * anything touches the database.
 */
import { drizzle } from "drizzle-orm/node-postgres";
import { migrate } from "drizzle-orm/node-postgres/migrator";
import { Pool } from "pg";
import { grantAppRolePrivileges } from "@/db/app-role-privileges";
import { backfillCompositionSummaries } from "./support/backfill-composition-summaries";

export const MIGRATIONS_FOLDER = new URL("../drizzle", import.meta.url).pathname;

export async function runMigrations(
  databaseUrl: string,
  migrationsFolder = MIGRATIONS_FOLDER,
): Promise<void> {
  const pool = new Pool({ connectionString: databaseUrl, max: 1 });
  try {
    await migrate(drizzle(pool), { migrationsFolder });
    const filled = await backfillCompositionSummaries(pool);
    if (filled > 0) console.log(`[ionleaf] composition summaries filled for ${filled} solutions`);
  } finally {
    await pool.end();
  }
}

/**
 * Migrations run as the owner of the tables (DATABASE_OWNER_URL); the server connects as
 * DATABASE_URL's role, which then gets exactly the privileges of db/app-role-privileges.ts.
 * With only DATABASE_URL set (an older installation) that role is the owner and nothing is
 * granted.
 */
async function main() {
  const appUrl = process.env.DATABASE_URL;
  if (!appUrl) throw new Error("DATABASE_URL is not set");
  const ownerUrl = process.env.DATABASE_OWNER_URL ?? appUrl;
  await runMigrations(ownerUrl);
  const appRole = decodeURIComponent(new URL(appUrl).username);
  if (appRole !== decodeURIComponent(new URL(ownerUrl).username)) {
    const pool = new Pool({ connectionString: ownerUrl, max: 1 });
    try {
      await grantAppRolePrivileges(pool, appRole);
    } finally {
      await pool.end();
    }
  }
}

const isMain = process.argv[1] && new URL(import.meta.url).pathname === process.argv[1];
if (isMain) {
  main()
    .then(() => console.log("[ionleaf] migrations applied"))
    .catch((error: unknown) => {
      console.error("[ionleaf] migration failed:", error instanceof Error ? error.message : error);
      process.exit(1);
    });
}
