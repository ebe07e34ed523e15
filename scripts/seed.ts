/**
 * Seeds the demo scenario into DATABASE_URL once (run by `npm start`; `npm test` seeds its
 * throwaway database before the end-to-end tests). Run with --conditions=react-server so
 * that server-only modules load outside Next.js.
 */
import { createDatabase } from "@/db/client";
import { seedDemo } from "@/lib/demo/seed";
import { demoContent } from "@/lib/demo/content";

async function main() {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error("DATABASE_URL is not set");
  const { db, pool } = createDatabase(url, 2);
  try {
    const { created, skipped } = await seedDemo(db, { afterLab: demoContent });
    if (created.length) console.log(`[ionleaf] demo labs created: ${created.join(", ")}`);
    if (skipped.length) console.log(`[ionleaf] demo labs already present, left unchanged: ${skipped.join(", ")}`);
  } finally {
    await pool.end();
  }
}

main().catch((error: unknown) => {
  console.error("[ionleaf] seeding failed:", error instanceof Error ? error.message : error);
  process.exit(1);
});
