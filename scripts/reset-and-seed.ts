/** Test harness only: empties every table of the throwaway database and seeds the demo scenario. */
import { createDatabase } from "@/db/client";
import { seedDemo } from "@/lib/demo/seed";
import { demoContent } from "@/lib/demo/content";
import { truncateAll } from "@/tests/support/truncate";

async function main() {
  const url = process.env.DATABASE_URL ?? "";
  if (!/ionleaf_test/.test(url)) throw new Error("reset-and-seed refuses to run outside the test database");
  const { db, pool } = createDatabase(url, 2);
  try {
    await truncateAll(db);
    await seedDemo(db, { afterLab: demoContent });
  } finally {
    await pool.end();
  }
}
main().catch((e: unknown) => { console.error(e); process.exit(1); });
