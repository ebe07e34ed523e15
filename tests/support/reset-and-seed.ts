/** Test harness only: empties every table of the throwaway database and seeds the demo scenario. */
import { seedDemo } from "@/lib/demo/seed";
import { demoContent } from "@/lib/demo/content";
import { createDatabase } from "@/db/client";
import { closeDb, getDb } from "@/lib/server/database";
import { truncateAll } from "./truncate";

async function main() {
  if (!/ionleaf_test/.test(process.env.DATABASE_URL ?? ""))
    throw new Error("reset-and-seed refuses to run outside the test database");
  try {
    // TRUNCATE is the owner's; the app role that seeds (as the server would) may not.
    const owner = createDatabase(process.env.DATABASE_OWNER_URL ?? process.env.DATABASE_URL!, 1);
    await truncateAll(owner.db).finally(() => owner.pool.end());
    await seedDemo(getDb(), { afterLab: demoContent });
  } finally {
    await closeDb();
  }
}
main().catch((e: unknown) => {
  console.error(e);
  process.exit(1);
});
