import "server-only";
import type { Database } from "@/db/client";

/**
 * Demo notebook content for a freshly seeded lab. Entries with solution blocks are added
 * here once the notebook service exists; until then a lab starts with its projects only.
 */
export async function demoContent(_db: Database, _lab: { id: string; slug: string }, _members: Record<string, string>): Promise<void> {
  // Intentionally empty for now: see lib/entries for the notebook service.
}
