import "server-only";
import type { Executor } from "@/db/client";
import { insertRevision, updateEntry } from "@/db/queries/entries";
import { insertSolutionWithComponents } from "@/db/queries/solutions";
import { canonicalHash } from "@/lib/entries/canonical-hash";
import { extractSolutionBlocks } from "@/lib/entries/extract-blocks";
import { documentPlainText } from "./plain-text";
import { solutionRecordFor } from "./solution-records";

/** The content hash a revision (and later a signature) records: SHA-256 of canonical { title, content }. */
export function revisionHash(title: string, content: unknown): string {
  return canonicalHash({ title, content });
}

export interface NewRevision {
  labId: string;
  entryId: string;
  number: number;
  title: string;
  content: unknown;
  authorId: string;
}

/**
 * Writes one immutable revision, the server's own recomputation of every solution block in
 * it (one row per block), and moves the entry to that revision. The caller holds the
 * transaction and has already checked who may write and against which base revision.
 */
export async function appendRevision(
  tx: Executor,
  r: NewRevision,
): Promise<{ contentHash: string; solutions: number }> {
  const contentHash = revisionHash(r.title, r.content);
  const revision = await insertRevision(tx, {
    entryId: r.entryId,
    number: r.number,
    title: r.title,
    content: r.content as Record<string, unknown>,
    contentText: documentPlainText(r.content),
    contentHash,
    authorId: r.authorId,
  });
  const blocks = extractSolutionBlocks(r.content);
  for (const block of blocks) {
    const { components, ...record } = solutionRecordFor(block);
    await insertSolutionWithComponents(
      tx,
      { labId: r.labId, entryId: r.entryId, revisionId: revision.id, ...record },
      components,
    );
  }
  await updateEntry(tx, r.labId, r.entryId, {
    currentRevisionNumber: r.number,
    title: r.title,
    updatedAt: new Date(),
  });
  return { contentHash, solutions: blocks.length };
}
