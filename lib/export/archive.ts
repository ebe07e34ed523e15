import "server-only";
import { insertAuditEvent } from "@/db/queries/audit";
import { findLabById } from "@/db/queries/labs";
import { AppError } from "@/lib/errors";
import { revisionAttachmentsForSignature } from "@/lib/notebook/attachment-hashes";
import { getEntryHeader } from "@/lib/notebook/entries";
import { storedResultsOf } from "@/lib/notebook/review-view";
import { getRevisionPage } from "@/lib/notebook/revisions";
import { type verifyRevision } from "@/lib/notebook/verification";
import { assertCan, type Actor } from "@/lib/rules/authorize";
import { getDb } from "@/lib/server/database";

/**
 * A self-contained record of one revision: content, the numbers stored for it, its
 * signatures (with whether each still verifies), the hashes of its attachments, and the
 * verification of the entry's chain. The JSON export is exactly this; the PDF prints it.
 */
export interface EntryArchive {
  format: "ionleaf-entry-archive/1";
  exportedAt: string;
  exportedBy: string;
  lab: { id: string; name: string };
  entry: { id: string; title: string; status: string; projectName: string; authorName: string };
  revision: {
    number: number;
    title: string;
    content: unknown;
    contentHash: string;
    createdAt: string;
    authorName: string;
    amends: number | null;
    amendmentReason: string | null;
  };
  solutions: {
    blockId: string;
    engineVersion: string;
    computedAt: string;
    results: Record<string, unknown>;
  }[];
  signatures: {
    revision: number;
    signerName: string;
    meaning: string;
    comment: string;
    signedAt: string;
    contentHash: string;
    valid: boolean;
  }[];
  attachments: { name: string; sha256: string }[];
  verification: Awaited<ReturnType<typeof verifyRevision>>;
}

/**
 * The archive of a revision; by default the newest countersigned one (the record), or the
 * current one when nothing is signed yet. Every export is written to the audit trail.
 */
export async function buildEntryArchive(
  actor: Actor,
  entryId: string,
  requestedRevision: number | null,
  format: "json" | "pdf",
): Promise<EntryArchive> {
  assertCan(actor, "entry.read");
  const header = await getEntryHeader(actor, entryId);
  const { entry } = header;
  const number = requestedRevision ?? entry.signedRevisionNumber ?? entry.currentRevisionNumber;
  if (number < 1) throw new AppError("not_found", "This entry has no saved revision to export.");
  const db = getDb();
  const [page, stored, lab] = await Promise.all([
    getRevisionPage(actor, entry.id, number),
    storedResultsOf(db, actor.labId, entry.id, number),
    findLabById(db, actor.labId),
  ]);
  const { revision, verification } = page;
  const attachments = await revisionAttachmentsForSignature(
    db,
    actor.labId,
    entry.id,
    revision.content,
  );
  await insertAuditEvent(db, {
    labId: actor.labId,
    actorId: actor.userId,
    action: "entry.exported",
    targetType: "entry",
    targetId: entry.id,
    details: { revision: number, format },
  });
  return {
    format: "ionleaf-entry-archive/1",
    exportedAt: new Date().toISOString(),
    exportedBy: actor.name,
    lab: { id: actor.labId, name: lab?.name ?? "" },
    entry: {
      id: entry.id,
      title: entry.title,
      status: entry.status,
      projectName: header.projectName,
      authorName: header.authorName,
    },
    revision: {
      number: revision.number,
      title: revision.title,
      content: revision.content,
      contentHash: revision.contentHash,
      createdAt: revision.createdAt,
      authorName: revision.authorName,
      amends: revision.amendsRevisionNumber,
      amendmentReason: revision.amendmentReason,
    },
    solutions: [...stored].map(([blockId, s]) => ({ blockId, ...s })),
    signatures: verification.signatures.map((s) => ({ ...s, revision: number })),
    attachments,
    verification,
  };
}
