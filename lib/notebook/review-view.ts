import "server-only";
import { findRevision, listRevisions } from "@/db/queries/entries";
import { listEntrySignatures, listReviewRequests } from "@/db/queries/review";
import { listRevisionSolutions } from "@/db/queries/solutions";
import type { Executor } from "@/db/client";
import { compareRevisions, type ReviewSide } from "@/lib/document/review-diff";
import { AppError } from "@/lib/errors";
import { assertCan, type Actor } from "@/lib/rules/authorize";
import { getDb } from "@/lib/server/database";
import { getEntryHeader } from "./entries";

/** The stored result of every solution block a revision showed, by block id. */
export async function storedResultsOf(
  db: Executor,
  labId: string,
  entryId: string,
  revision: number,
) {
  const rows = await listRevisionSolutions(db, labId, entryId, revision);
  return new Map(
    rows.map(({ block, result }) => [
      block.blockId,
      {
        results: result.results,
        engineVersion: result.engineVersion,
        computedAt: result.createdAt.toISOString(),
      },
    ]),
  );
}

async function sideOf(
  db: Executor,
  labId: string,
  entryId: string,
  number: number,
): Promise<ReviewSide> {
  const found = await findRevision(db, entryId, number);
  if (!found) throw new AppError("not_found", "Revision not found.");
  const stored = await storedResultsOf(db, labId, entryId, number);
  return {
    title: found.revision.title,
    content: found.revision.content,
    results: new Map([...stored].map(([id, s]) => [id, s.results])),
  };
}

/**
 * What a reviewer sees: the revision under review, and what changed since the entry's last
 * countersigned revision (or since nothing, for a first review), with stored numbers only.
 */
export async function getReviewView(actor: Actor, entryId: string) {
  assertCan(actor, "entry.read");
  const header = await getEntryHeader(actor, entryId);
  const { entry } = header;
  if (entry.currentRevisionNumber === 0)
    throw new AppError("not_found", "This entry has no saved revision yet.");
  const db = getDb();
  const after = await sideOf(db, actor.labId, entry.id, entry.currentRevisionNumber);
  const baseline =
    entry.signedRevisionNumber !== null && entry.signedRevisionNumber < entry.currentRevisionNumber
      ? entry.signedRevisionNumber
      : null;
  const before = baseline !== null ? await sideOf(db, actor.labId, entry.id, baseline) : null;
  return {
    ...header,
    revision: entry.currentRevisionNumber,
    baselineRevision: baseline,
    comparison: compareRevisions(before, after),
  };
}

/**
 * What changed in an entry between two of its revisions, with stored numbers only: the link a
 * notice of a newer stock revision points to. Any member of the lab may read it.
 */
export async function getRevisionComparison(
  actor: Actor,
  entryId: string,
  from: number,
  to: number,
) {
  assertCan(actor, "entry.read");
  const header = await getEntryHeader(actor, entryId);
  const { entry } = header;
  if (from >= to || to > entry.currentRevisionNumber)
    throw new AppError("not_found", "Revision not found.");
  const db = getDb();
  const [before, after] = await Promise.all([
    sideOf(db, actor.labId, entry.id, from),
    sideOf(db, actor.labId, entry.id, to),
  ]);
  return { ...header, from, to, comparison: compareRevisions(before, after) };
}

/** An entry's history: revisions (amendments marked), submissions, returns with comments, signatures. */
export async function getEntryHistory(actor: Actor, entryId: string) {
  assertCan(actor, "entry.read");
  const header = await getEntryHeader(actor, entryId);
  const db = getDb();
  const [revisions, requests, signatures] = await Promise.all([
    listRevisions(db, header.entry.id),
    listReviewRequests(db, actor.labId, header.entry.id),
    listEntrySignatures(db, actor.labId, header.entry.id),
  ]);
  type Event = { at: string; kind: string; revision: number; who: string; text: string };
  const events: Event[] = [];
  for (const r of revisions) {
    events.push({
      at: r.createdAt.toISOString(),
      kind: r.amendsRevisionNumber !== null ? "amendment revision" : "revision",
      revision: r.number,
      who: r.authorName,
      text:
        r.amendsRevisionNumber !== null
          ? `Amends revision ${r.amendsRevisionNumber}: ${r.amendmentReason}`
          : "",
    });
  }
  for (const { request, submittedByName, reviewerName, decidedByName } of requests) {
    events.push({
      at: request.submittedAt.toISOString(),
      kind: "submitted",
      revision: request.revisionNumber,
      who: submittedByName,
      text: `For review by ${reviewerName ?? "any supervisor"}`,
    });
    if (request.decision === "returned" && request.decidedAt) {
      events.push({
        at: request.decidedAt.toISOString(),
        kind: "returned",
        revision: request.revisionNumber,
        who: decidedByName ?? "",
        text: request.comment,
      });
    }
  }
  for (const s of signatures) {
    events.push({
      at: s.signedAt.toISOString(),
      kind: "countersigned",
      revision: s.revisionNumber,
      who: s.signerName,
      text: s.comment,
    });
  }
  events.sort((a, b) => b.at.localeCompare(a.at));
  return {
    ...header,
    events,
    signatures: signatures.map((s) => ({
      revision: s.revisionNumber,
      signerName: s.signerName,
      meaning: s.meaning,
      comment: s.comment,
      signedAt: s.signedAt.toISOString(),
      contentHash: s.contentHash,
    })),
  };
}
