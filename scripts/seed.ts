/**
 * Seeds the demo scenario into DATABASE_URL once (run by `npm start`). Run with
 * --conditions=react-server so that server-only modules load outside Next.js.
 */
import { seedDemo } from "@/lib/demo/seed";
import { demoContent } from "@/lib/demo/content";
import { closeDb, getDb } from "@/lib/server/database";

async function main() {
  try {
    const { created, skipped } = await seedDemo(getDb(), { afterLab: demoContent });
    if (created.length) console.log(`[ionleaf] demo labs created: ${created.join(", ")}`);
    if (skipped.length)
      console.log(`[ionleaf] demo labs already present, left unchanged: ${skipped.join(", ")}`);
  } finally {
    await closeDb();
  }
}

main().catch((error: unknown) => {
  console.error("[ionleaf] seeding failed:", error instanceof Error ? error.message : error);
  process.exit(1);
});
