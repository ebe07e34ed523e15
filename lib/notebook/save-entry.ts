import "server-only";
import type { SaveResult } from "@/lib/contract/entries";
import { loadEntryFor } from "./entry-access";
import { insertAuditEvent } from "@/db/queries/audit";
import { findEntryAttachments } from "@/db/queries/attachments";
import { findRevision } from "@/db/queries/entries";
import { assertCan, type Actor } from "@/lib/rules/authorize";
import type { Executor } from "@/db/client";
import type { Entry } from "@/db/schema";
import { prepareRevision, type PreparedRevision } from "@/lib/document/prepare-revision";
import { AppError } from "@/lib/errors";
import { getDb } from "@/lib/server/database";
import { saveEntrySchema } from "@/lib/validation/entries";
import { parseInput } from "@/lib/validation/parse";
import { appendRevision } from "./append-revision";

/**
 * Autosave. The editor sends the revision number it started from; a save against an older
 * one is refused with 409, so nothing is ever silently overwritten. A save that changes the
 * content writes a new immutable revision and the server-computed solution rows, in one
 * transaction; a save that changes nothing writes nothing.
 */
export async function saveEntryContent(
  actor: Actor,
  entryId: string,
  raw: unknown,
): Promise<SaveResult> {
  assertCan(actor, "entry.write");
  const input = parseInput(saveEntrySchema, raw);
  const prepared = prepareRevision(input.title, input.content);

  return getDb().transaction(async (tx) => {
    const entry = await loadEntryFor(tx, actor, entryId, "edit", { forUpdate: true });
    return writeRevision(tx, actor, entry, input.baseRevision, prepared);
  });
}

/**
 * The save itself, inside the caller's transaction, for an entry the caller loaded FOR UPDATE
 * through the entry rules ("edit"): refuses a stale base revision, writes nothing for an
 * unchanged document, else appends the revision with its solution rows.
 */
export async function writeRevision(
  tx: Executor,
  actor: Actor,
  entry: Entry,
  baseRevision: number,
  prepared: PreparedRevision,
): Promise<SaveResult> {
  const { contentHash } = prepared;
  if (entry.currentRevisionNumber !== baseRevision) {
    // The current revision's hash lets an editor whose earlier save was committed but never
    // answered (the server died before replying) recognise that revision as its own.
    const current =
      entry.currentRevisionNumber > 0
        ? await findRevision(tx, entry.id, entry.currentRevisionNumber)
        : null;
    throw new AppError("conflict", "This entry was saved elsewhere since you opened it.", {
      details: {
        currentRevision: entry.currentRevisionNumber,
        baseRevision,
        currentContentHash: current?.revision.contentHash ?? null,
      },
    });
  }
  if (entry.currentRevisionNumber > 0) {
    const current = await findRevision(tx, entry.id, entry.currentRevisionNumber);
    if (current?.revision.contentHash === contentHash) {
      return {
        revision: entry.currentRevisionNumber,
        contentHash,
        created: false,
        solutions: prepared.solutionBlocks.length,
        solutionRowsWritten: 0,
      };
    }
  }
  // A document may show only files attached to this entry (never another entry's or lab's).
  const attached = await findEntryAttachments(tx, actor.labId, entry.id, prepared.attachmentIds);
  if (attached.length !== prepared.attachmentIds.length) {
    throw new AppError(
      "invalid_input",
      "The document refers to a file that is not attached to this entry; the previous revision is unchanged.",
    );
  }
  const number = entry.currentRevisionNumber + 1;
  // While an amendment is in progress, every revision is marked as part of it.
  const amendment =
    entry.status === "amended" && entry.signedRevisionNumber !== null
      ? { amendsRevisionNumber: entry.signedRevisionNumber, reason: entry.amendmentReason ?? "" }
      : null;
  const appended = await appendRevision(tx, {
    labId: actor.labId,
    entryId: entry.id,
    number,
    authorId: actor.userId,
    prepared,
    amendment,
  });
  await insertAuditEvent(tx, {
    labId: actor.labId,
    actorId: actor.userId,
    action: "entry.saved",
    targetType: "entry",
    targetId: entry.id,
    details: { revision: number, contentHash, amendment: amendment !== null },
  });
  return {
    revision: number,
    contentHash,
    created: true,
    solutions: appended.solutions,
    solutionRowsWritten: appended.solutionRowsWritten,
  };
}
