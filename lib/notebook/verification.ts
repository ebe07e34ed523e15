import "server-only";
import { findRevision, listRevisions } from "@/db/queries/entries";
import { listEntrySignatures } from "@/db/queries/review";
import { revisionHash } from "@/lib/document/prepare-revision";
import { signedContentHash } from "@/lib/document/signed-content";
import { AppError } from "@/lib/errors";
import { assertCan, type Actor } from "@/lib/rules/authorize";
import { getDb } from "@/lib/server/database";
import { revisionAttachmentsForSignature } from "./attachment-hashes";
import { loadEntryFor } from "./entry-access";

export interface RevisionVerification {
  entryId: string;
  revision: number;
  storedHash: string;
  recomputedHash: string;
  /** The stored content still hashes to the stored hash. */
  intact: boolean;
  signatures: {
    signerName: string;
    meaning: string;
    comment: string;
    signedAt: string;
    contentHash: string;
    recomputedHash: string;
    valid: boolean;
  }[];
  chain: { unbroken: boolean; revisions: number; problems: string[] };
}

/**
 * Verifies a revision from what is stored: its content against its hash, each signature of
 * it against the signed content recomputed now (document and attachment hashes), and the
 * entry's chain of revisions (numbered 1…n without gaps, every revision intact, every
 * amendment pointing at a countersigned revision before it).
 */
export async function verifyRevision(
  actor: Actor,
  entryId: string,
  number: number,
): Promise<RevisionVerification> {
  assertCan(actor, "entry.read");
  const db = getDb();
  const entry = await loadEntryFor(db, actor, entryId, "view");
  if (!Number.isSafeInteger(number) || number < 1)
    throw new AppError("not_found", "Revision not found.");
  const found = await findRevision(db, entry.id, number);
  if (!found) throw new AppError("not_found", "Revision not found.");
  const { revision } = found;
  const recomputedHash = revisionHash(revision.title, revision.content);

  const attachments = await revisionAttachmentsForSignature(
    db,
    actor.labId,
    entry.id,
    revision.content,
  );
  const signedNow = signedContentHash({
    title: revision.title,
    content: revision.content,
    attachments,
  });
  const allSignatures = await listEntrySignatures(db, actor.labId, entry.id);
  const signatures = allSignatures
    .filter((s) => s.revisionNumber === number)
    .map((s) => ({
      signerName: s.signerName,
      meaning: s.meaning,
      comment: s.comment,
      signedAt: s.signedAt.toISOString(),
      contentHash: s.contentHash,
      recomputedHash: signedNow,
      valid: s.contentHash === signedNow,
    }));

  const problems: string[] = [];
  const history = (await listRevisions(db, entry.id)).sort((a, b) => a.number - b.number);
  const signedNumbers = new Set(allSignatures.map((s) => s.revisionNumber));
  history.forEach((r, i) => {
    if (r.number !== i + 1) problems.push(`Revision ${i + 1} is missing.`);
    if (revisionHash(r.title, r.content) !== r.contentHash)
      problems.push(`Revision ${r.number} no longer matches its stored hash.`);
    if (
      r.amendsRevisionNumber !== null &&
      (!signedNumbers.has(r.amendsRevisionNumber) || r.amendsRevisionNumber >= r.number)
    )
      problems.push(
        `Revision ${r.number} amends revision ${r.amendsRevisionNumber}, which is not a countersigned revision before it.`,
      );
  });
  if (history.length !== entry.currentRevisionNumber)
    problems.push(
      `The entry points at revision ${entry.currentRevisionNumber} but has ${history.length}.`,
    );

  return {
    entryId: entry.id,
    revision: number,
    storedHash: revision.contentHash,
    recomputedHash,
    intact: recomputedHash === revision.contentHash,
    signatures,
    chain: { unbroken: problems.length === 0, revisions: history.length, problems },
  };
}
