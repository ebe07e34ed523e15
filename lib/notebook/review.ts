import "server-only";
import { insertAuditEvent } from "@/db/queries/audit";
import { findRevision, updateEntry } from "@/db/queries/entries";
import {
  closeReviewRequest,
  findOpenReviewRequest,
  insertReviewRequest,
  insertSignature,
  listReviewQueue,
} from "@/db/queries/review";
import { findUserById, listLabSupervisors } from "@/db/queries/users";
import { confirmPassword } from "@/lib/auth/confirm-password";
import { revisionHash } from "@/lib/document/prepare-revision";
import { signedContentHash } from "@/lib/document/signed-content";
import { getEnv } from "@/lib/env";
import { AppError, isAppError } from "@/lib/errors";
import { appErrorFromDatabase } from "@/lib/errors/database";
import { kickOutbox, queueMails } from "@/lib/mail/outbox";
import { reviewDecidedMail, reviewRequestedMail } from "@/lib/mail/templates";
import { assertCan, type Actor } from "@/lib/rules/authorize";
import { getDb } from "@/lib/server/database";
import { parseInput } from "@/lib/validation/parse";
import {
  amendEntrySchema,
  countersignSchema,
  returnEntrySchema,
  submitEntrySchema,
} from "@/lib/validation/review";
import { revisionAttachmentsForSignature } from "./attachment-hashes";
import { loadEntryFor } from "./entry-access";

/**
 * Submitting, countersigning, returning and amending: the review of an entry. Every step is
 * checked by the entry rules, runs in one transaction with the entry row locked, writes its
 * audit event, and queues its mails to be sent after the commit.
 */

/** draft, returned or amended → submitted: the author asks one supervisor, or all of them. */
export async function submitEntry(actor: Actor, entryId: string, raw: unknown = {}): Promise<void> {
  assertCan(actor, "entry.write");
  const { reviewerId } = parseInput(submitEntrySchema, raw ?? {});
  await getDb().transaction(async (tx) => {
    const entry = await loadEntryFor(tx, actor, entryId, "submit", { forUpdate: true });
    const supervisors = (await listLabSupervisors(tx, actor.labId)).filter(
      (s) => s.id !== entry.authorId,
    );
    if (supervisors.length === 0) {
      throw new AppError(
        "conflict",
        "Your lab has no other supervisor who could countersign this entry; ask a lab admin.",
      );
    }
    const chosen = reviewerId ? supervisors.find((s) => s.id === reviewerId) : undefined;
    if (reviewerId && !chosen) {
      throw new AppError("invalid_input", "Choose a supervisor of your lab.", {
        fieldErrors: { reviewerId: ["Choose a supervisor of your lab (not yourself)."] },
      });
    }
    await updateEntry(tx, actor.labId, entry.id, { status: "submitted", updatedAt: new Date() });
    await insertReviewRequest(tx, {
      labId: actor.labId,
      entryId: entry.id,
      revisionNumber: entry.currentRevisionNumber,
      submittedById: actor.userId,
      reviewerId: chosen?.id ?? null,
    });
    await insertAuditEvent(tx, {
      labId: actor.labId,
      actorId: actor.userId,
      action: "entry.submitted",
      targetType: "entry",
      targetId: entry.id,
      details: {
        revision: entry.currentRevisionNumber,
        reviewer: chosen?.name ?? "any supervisor",
        amendment: entry.signedRevisionNumber !== null,
      },
    });
    const mail = reviewRequestedMail({
      appUrl: getEnv().APP_URL,
      entryId: entry.id,
      entryTitle: entry.title,
      authorName: actor.name,
      revision: entry.currentRevisionNumber,
      amendment: entry.signedRevisionNumber !== null,
    });
    await queueMails(
      tx,
      (chosen ? [chosen] : supervisors).map((s) => ({
        labId: actor.labId,
        kind: "review.requested",
        to: s.email,
        ...mail,
      })),
    );
  });
  kickOutbox();
}

/**
 * Countersign = an electronic signature: the supervisor re-enters their password and picks
 * what the signature means; the row records signer, meaning, comment, server time and the
 * SHA-256 of the signed content. A refusal of any kind is itself recorded in the audit trail.
 */
export async function countersignEntry(
  actor: Actor,
  entryId: string,
  raw: unknown,
): Promise<{ revision: number; contentHash: string; signedAt: string }> {
  return recordRefusals(actor, entryId, "countersign", async () => {
    assertCan(actor, "entry.countersign");
    const input = parseInput(countersignSchema, raw);
    // Checked before the password so a refused signer learns why without spending an attempt.
    await checkReviewable(actor, entryId, "countersign", input.revision);
    await confirmPassword(getDb(), actor, input.password);
    const signed = await getDb().transaction(async (tx) => {
      const entry = await checkReviewable(actor, entryId, "countersign", input.revision, tx);
      const found = await findRevision(tx, entry.id, input.revision);
      if (!found) throw new AppError("not_found", "Revision not found.");
      const { revision } = found;
      if (revisionHash(revision.title, revision.content) !== revision.contentHash) {
        throw new AppError(
          "conflict",
          "This revision's stored content no longer matches its hash; it cannot be signed.",
        );
      }
      const contentHash = signedContentHash({
        title: revision.title,
        content: revision.content,
        attachments: await revisionAttachmentsForSignature(
          tx,
          actor.labId,
          entry.id,
          revision.content,
        ),
      });
      const signature = await insertSignature(tx, {
        labId: actor.labId,
        entryId: entry.id,
        revisionId: revision.id,
        revisionNumber: revision.number,
        signerId: actor.userId,
        signerName: actor.name,
        meaning: input.meaning,
        contentHash,
        comment: input.comment,
      });
      await updateEntry(tx, actor.labId, entry.id, {
        status: "countersigned",
        signedRevisionNumber: revision.number,
        amendmentReason: null,
        updatedAt: new Date(),
      });
      const request = await findOpenReviewRequest(tx, actor.labId, entry.id);
      if (request) {
        await closeReviewRequest(tx, actor.labId, request.id, {
          decision: "countersigned",
          decidedById: actor.userId,
          comment: input.comment,
        });
      }
      await insertAuditEvent(tx, {
        labId: actor.labId,
        actorId: actor.userId,
        action: "entry.countersigned",
        targetType: "entry",
        targetId: entry.id,
        details: { revision: revision.number, meaning: input.meaning, contentHash },
      });
      await queueDecisionMail(tx, actor, entry, revision.number, "countersigned", input.comment);
      return { revision: revision.number, contentHash, signedAt: signature.signedAt.toISOString() };
    });
    kickOutbox();
    return signed;
  });
}

/** submitted → returned: a comment is required; the author can edit again. */
export async function returnEntry(actor: Actor, entryId: string, raw: unknown): Promise<void> {
  await recordRefusals(actor, entryId, "return", async () => {
    assertCan(actor, "entry.countersign");
    const input = parseInput(returnEntrySchema, raw);
    await getDb().transaction(async (tx) => {
      const entry = await checkReviewable(actor, entryId, "return", input.revision, tx);
      await updateEntry(tx, actor.labId, entry.id, { status: "returned", updatedAt: new Date() });
      const request = await findOpenReviewRequest(tx, actor.labId, entry.id);
      if (request) {
        await closeReviewRequest(tx, actor.labId, request.id, {
          decision: "returned",
          decidedById: actor.userId,
          comment: input.comment,
        });
      }
      await insertAuditEvent(tx, {
        labId: actor.labId,
        actorId: actor.userId,
        action: "entry.returned",
        targetType: "entry",
        targetId: entry.id,
        details: { revision: input.revision, comment: input.comment },
      });
      await queueDecisionMail(tx, actor, entry, input.revision, "returned", input.comment);
    });
    kickOutbox();
  });
}

/**
 * countersigned → amended: the author starts an amendment with its reason. The signed
 * revision stays as it is, forever; the next saves are new revisions marked as amending it,
 * and the amendment needs its own countersignature.
 */
export async function startAmendment(actor: Actor, entryId: string, raw: unknown): Promise<void> {
  assertCan(actor, "entry.write");
  const { reason } = parseInput(amendEntrySchema, raw);
  await getDb().transaction(async (tx) => {
    const entry = await loadEntryFor(tx, actor, entryId, "amend", { forUpdate: true });
    await updateEntry(tx, actor.labId, entry.id, {
      status: "amended",
      amendmentReason: reason,
      updatedAt: new Date(),
    });
    await insertAuditEvent(tx, {
      labId: actor.labId,
      actorId: actor.userId,
      action: "entry.amendment_started",
      targetType: "entry",
      targetId: entry.id,
      details: { signedRevision: entry.signedRevisionNumber, reason },
    });
  });
}

/** The review queue of a supervisor: submitted entries addressed to them or to anyone. */
export async function getReviewQueue(actor: Actor) {
  assertCan(actor, "review.read");
  const rows = await listReviewQueue(getDb(), actor.labId, actor.userId);
  return rows.map((r) => ({
    ...r,
    submittedAt: r.submittedAt.toISOString(),
    addressedToMe: r.reviewerId === actor.userId,
  }));
}

/** Supervisors an author can ask to review (not the author). */
export async function listPossibleReviewers(actor: Actor) {
  assertCan(actor, "entry.write");
  const supervisors = await listLabSupervisors(getDb(), actor.labId);
  return supervisors.filter((s) => s.id !== actor.userId).map(({ id, name }) => ({ id, name }));
}

async function checkReviewable(
  actor: Actor,
  entryId: string,
  action: "countersign" | "return",
  revision: number,
  tx?: Parameters<Parameters<ReturnType<typeof getDb>["transaction"]>[0]>[0],
) {
  const entry = await loadEntryFor(tx ?? getDb(), actor, entryId, action, { forUpdate: !!tx });
  if (entry.currentRevisionNumber !== revision) {
    throw new AppError(
      "conflict",
      `Revision ${revision} is no longer the current revision (${entry.currentRevisionNumber}); review the current one.`,
      { details: { currentRevision: entry.currentRevisionNumber } },
    );
  }
  return entry;
}

async function queueDecisionMail(
  tx: Parameters<typeof queueMails>[0],
  actor: Actor,
  entry: { id: string; title: string; authorId: string },
  revision: number,
  decision: "countersigned" | "returned",
  comment: string,
) {
  const author = await findUserById(tx, entry.authorId);
  if (!author?.active) return;
  await queueMails(tx, [
    {
      labId: actor.labId,
      kind: `review.${decision}`,
      to: author.email,
      ...reviewDecidedMail({
        appUrl: getEnv().APP_URL,
        entryId: entry.id,
        entryTitle: entry.title,
        reviewerName: actor.name,
        revision,
        decision,
        comment,
      }),
    },
  ]);
}

/**
 * Runs a review step; when it is refused (wrong password, not the current revision, already
 * signed, not allowed…) the refusal is written to the audit trail before the error goes back
 * to the caller. Database errors become typed errors here too (a concurrent second
 * signature hits the unique constraint: 409).
 */
async function recordRefusals<T>(
  actor: Actor,
  entryId: string,
  action: "countersign" | "return",
  body: () => Promise<T>,
): Promise<T> {
  try {
    return await body();
  } catch (error) {
    const appError = isAppError(error) ? error : appErrorFromDatabase(error);
    if (!appError) throw error;
    await insertAuditEvent(getDb(), {
      labId: actor.labId,
      actorId: actor.userId,
      action: action === "countersign" ? "signature.refused" : "return.refused",
      targetType: "entry",
      targetId: entryId.slice(0, 64),
      details: { code: appError.code, reason: appError.message },
    });
    throw appError;
  }
}
