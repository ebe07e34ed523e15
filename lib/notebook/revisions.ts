import "server-only";
import { loadEntryFor } from "./entry-access";
import { findRevision, listRevisions } from "@/db/queries/entries";
import { listRevisionSolutions } from "@/db/queries/solutions";
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
    };
  }
  return revisionOf(entry.id, entry.currentRevisionNumber);
}

export async function getRevision(
  actor: Actor,
  entryId: string,
  number: number,
): Promise<RevisionDto> {
  const entry = await entryOf(actor, entryId);
  return revisionOf(entry.id, number);
}

export async function getCurrentContent(actor: Actor, entryId: string): Promise<RevisionDto> {
  return currentOf(await entryOf(actor, entryId));
}

/** What the entry page and GET /api/entries/:id show: the header and the current content. */
export async function openEntry(actor: Actor, entryId: string) {
  const header = await getEntryHeader(actor, entryId);
  return { ...header, current: await currentOf(header.entry) };
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
