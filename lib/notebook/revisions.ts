import "server-only";
import { loadEntryFor } from "./entry-access";
import { findRevision, listRevisions } from "@/db/queries/entries";
import { listEntrySignatures } from "@/db/queries/review";
import { listRevisionSolutions } from "@/db/queries/solutions";
import type { StoredSolution } from "@/lib/document/stored-evaluation";
import { storedResultsOf } from "./review-view";
import { verifyRevision } from "./verification";
import { assertCan, type Actor } from "@/lib/rules/authorize";
import { AppError } from "@/lib/errors";
import { getDb } from "@/lib/server/database";
import { EMPTY_DOCUMENT, getEntryHeader } from "./entries";
import { summariseChange } from "@/lib/document/revision-diff";

export interface RevisionDto {
  number: number;
  title: string;
  content: unknown;
  contentHash: string;
  authorName: string;
  createdAt: string;
  /** For an amendment: the countersigned revision it amends, and why. */
  amendsRevisionNumber: number | null;
  amendmentReason: string | null;
}

async function entryOf(actor: Actor, entryId: string) {
  assertCan(actor, "entry.read");
  return loadEntryFor(getDb(), actor, entryId, "view");
}

async function findRevisionOrThrow(entryId: string, number: number) {
  if (!Number.isInteger(number) || number < 1)
    throw new AppError("not_found", "Revision not found.");
  const found = await findRevision(getDb(), entryId, number);
  if (!found) throw new AppError("not_found", "Revision not found.");
  return found;
}

async function revisionOf(entryId: string, number: number): Promise<RevisionDto> {
  return toRevisionDto(await findRevisionOrThrow(entryId, number));
}

function toRevisionDto({
  revision: r,
  authorName,
}: NonNullable<Awaited<ReturnType<typeof findRevision>>>): RevisionDto {
  return {
    number: r.number,
    title: r.title,
    content: r.content,
    contentHash: r.contentHash,
    authorName,
    createdAt: r.createdAt.toISOString(),
    amendsRevisionNumber: r.amendsRevisionNumber,
    amendmentReason: r.amendmentReason,
  };
}

/** The newest revision, or an empty document at revision 0 for a new entry. */
function currentOf(entry: {
  id: string;
  title: string;
  currentRevisionNumber: number;
  createdAt: Date;
}): Promise<RevisionDto> | RevisionDto {
  if (entry.currentRevisionNumber === 0) {
    return {
      number: 0,
      title: entry.title,
      content: EMPTY_DOCUMENT,
      contentHash: "",
      authorName: "",
      createdAt: entry.createdAt.toISOString(),
      amendsRevisionNumber: null,
      amendmentReason: null,
    };
  }
  return revisionOf(entry.id, entry.currentRevisionNumber);
}

/** A saved revision as its page shows it: content, stored numbers, and its signatures' check. */
export async function getRevisionPage(actor: Actor, entryId: string, number: number) {
  const entry = await entryOf(actor, entryId);
  const revision = await revisionOf(entry.id, number);
  const [stored, verification] = await Promise.all([
    storedResultsOf(getDb(), actor.labId, entry.id, number),
    verifyRevision(actor, entry.id, number),
  ]);
  return { revision, storedResults: Object.fromEntries(stored), verification };
}

export async function getCurrentContent(actor: Actor, entryId: string): Promise<RevisionDto> {
  return currentOf(await entryOf(actor, entryId));
}

/**
 * What the entry page and GET /api/entries/:id show: the header, the current content with the
 * numbers stored for it, and its signatures. "Amended after countersignature" holds while a
 * countersigned entry has newer revisions that are not signed yet.
 */
export async function openEntry(actor: Actor, entryId: string) {
  const header = await getEntryHeader(actor, entryId);
  const { entry } = header;
  const current = await currentOf(entry);
  const [stored, signatures] = await Promise.all([
    current.number > 0
      ? storedResultsOf(getDb(), actor.labId, entry.id, current.number)
      : Promise.resolve(new Map()),
    listEntrySignatures(getDb(), actor.labId, entry.id),
  ]);
  return {
    ...header,
    current,
    storedResults: Object.fromEntries(stored) as Record<string, StoredSolution>,
    amendedAfterCountersignature:
      entry.signedRevisionNumber !== null &&
      entry.currentRevisionNumber > entry.signedRevisionNumber,
    signatures: signatures.map((sig) => ({
      revision: sig.revisionNumber,
      signerName: sig.signerName,
      meaning: sig.meaning,
      comment: sig.comment,
      signedAt: sig.signedAt.toISOString(),
      contentHash: sig.contentHash,
    })),
  };
}

export async function getRevisionHistory(actor: Actor, entryId: string) {
  const entry = await entryOf(actor, entryId);
  const rows = await listRevisions(getDb(), entry.id); // newest first
  return rows.map((r, i) => ({
    number: r.number,
    title: r.title,
    contentHash: r.contentHash,
    authorName: r.authorName,
    createdAt: r.createdAt.toISOString(),
    amends: r.amendsRevisionNumber,
    amendmentReason: r.amendmentReason,
    changes: summariseChange(rows[i + 1] ?? null, r),
  }));
}

/** One revision with the server-computed solutions it showed (what the solution finder searches). */
export async function getRevisionWithSolutions(actor: Actor, entryId: string, number: number) {
  const entry = await entryOf(actor, entryId);
  const found = await findRevisionOrThrow(entry.id, number);
  const rows = await listRevisionSolutions(getDb(), actor.labId, entry.id, found.revision.number);
  return {
    revision: toRevisionDto(found),
    solutions: rows.map(({ block, result }) => ({
      blockId: block.blockId,
      name: result.name,
      engineVersion: result.engineVersion,
      temperatureC: result.temperatureC,
      solvent: result.solvent,
      modelRequested: result.modelRequested,
      modelUsed: result.modelUsed,
      ionicStrengthMolal: result.ionicStrengthMolal,
      ionicStrengthMolar: result.ionicStrengthMolar,
      debyeLengthNm: result.debyeLengthNm,
      species: result.species,
      inputs: result.inputs,
      results: result.results,
      computedAt: result.createdAt.toISOString(),
    })),
  };
}
