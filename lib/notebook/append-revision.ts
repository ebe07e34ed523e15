import "server-only";
import type { Executor } from "@/db/client";
import { insertRevision, updateEntry } from "@/db/queries/entries";
import { insertSolutionWithComponents } from "@/db/queries/solutions";
import type { PreparedRevision } from "@/lib/document/prepare-revision";

export interface NewRevision {
  labId: string;
  entryId: string;
  number: number;
  authorId: string;
  prepared: PreparedRevision;
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
  const { prepared } = r;
  const revision = await insertRevision(tx, {
    entryId: r.entryId,
    number: r.number,
    title: prepared.title,
    content: prepared.content,
    contentText: prepared.contentText,
    contentHash: prepared.contentHash,
    authorId: r.authorId,
  });
  for (const { components, ...record } of prepared.solutions) {
    await insertSolutionWithComponents(
      tx,
      { labId: r.labId, entryId: r.entryId, revisionId: revision.id, ...record },
      components,
    );
  }
  await updateEntry(tx, r.labId, r.entryId, {
    currentRevisionNumber: r.number,
    title: prepared.title,
    updatedAt: new Date(),
  });
  return { contentHash: prepared.contentHash, solutions: prepared.solutions.length };
}
