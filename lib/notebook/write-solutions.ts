import "server-only";
import type { Executor } from "@/db/client";
import { insertSolutionWithComponents } from "@/db/queries/solutions";
import { extractSolutionBlocks } from "@/lib/entries/extract-blocks";
import { solutionRecordFor } from "./solution-records";

/** Recomputes every solution block of a revision and writes one row per block (same transaction). */
export async function writeSolutionRecords(tx: Executor, where: { labId: string; entryId: string; revisionId: string }, content: unknown): Promise<number> {
  const blocks = extractSolutionBlocks(content);
  for (const block of blocks) {
    const { components, ...record } = solutionRecordFor(block);
    await insertSolutionWithComponents(tx, { ...where, ...record }, components);
  }
  return blocks.length;
}
