import { and, asc, desc, eq, isNull, or, sql } from "drizzle-orm";
import type { Executor } from "../client";
import {
  entries,
  projects,
  reviewRequests,
  signatures,
  users,
  type ReviewDecision,
} from "../schema";

export async function insertReviewRequest(db: Executor, row: typeof reviewRequests.$inferInsert) {
  const [inserted] = await db.insert(reviewRequests).values(row).returning();
  return inserted;
}

export async function findOpenReviewRequest(db: Executor, labId: string, entryId: string) {
  const rows = await db
    .select()
    .from(reviewRequests)
    .where(
      and(
        eq(reviewRequests.labId, labId),
        eq(reviewRequests.entryId, entryId),
        isNull(reviewRequests.decision),
      ),
    )
    .limit(1);
  return rows[0] ?? null;
}

export async function closeReviewRequest(
  db: Executor,
  labId: string,
  id: string,
  decision: { decision: ReviewDecision; decidedById: string; comment: string },
) {
  await db
    .update(reviewRequests)
    .set({ ...decision, decidedAt: new Date() })
    .where(
      and(
        eq(reviewRequests.labId, labId),
        eq(reviewRequests.id, id),
        isNull(reviewRequests.decision),
      ),
    );
}

/** Every request of an entry, oldest first, with the people's names: the entry's history. */
export async function listReviewRequests(db: Executor, labId: string, entryId: string) {
  const submitter = users;
  return db
    .select({
      request: reviewRequests,
      submittedByName: submitter.name,
      reviewerName: sql<
        string | null
      >`(select name from users u where u.id = ${reviewRequests.reviewerId})`,
      decidedByName: sql<
        string | null
      >`(select name from users u where u.id = ${reviewRequests.decidedById})`,
    })
    .from(reviewRequests)
    .innerJoin(submitter, eq(submitter.id, reviewRequests.submittedById))
    .where(and(eq(reviewRequests.labId, labId), eq(reviewRequests.entryId, entryId)))
    .orderBy(asc(reviewRequests.submittedAt));
}

/**
 * The review queue: open requests of the lab addressed to this supervisor or to any
 * supervisor, never the supervisor's own entries.
 */
export async function listReviewQueue(db: Executor, labId: string, supervisorId: string) {
  return db
    .select({
      entryId: entries.id,
      title: entries.title,
      revision: reviewRequests.revisionNumber,
      submittedAt: reviewRequests.submittedAt,
      authorName: users.name,
      projectName: projects.name,
      reviewerId: reviewRequests.reviewerId,
      amendment: sql<boolean>`${entries.signedRevisionNumber} is not null`,
    })
    .from(reviewRequests)
    .innerJoin(entries, eq(entries.id, reviewRequests.entryId))
    .innerJoin(users, eq(users.id, entries.authorId))
    .innerJoin(projects, eq(projects.id, entries.projectId))
    .where(
      and(
        eq(reviewRequests.labId, labId),
        isNull(reviewRequests.decision),
        sql`${entries.authorId} <> ${supervisorId}`,
        or(isNull(reviewRequests.reviewerId), eq(reviewRequests.reviewerId, supervisorId)),
      ),
    )
    .orderBy(asc(reviewRequests.submittedAt));
}

export async function insertSignature(db: Executor, row: typeof signatures.$inferInsert) {
  const [inserted] = await db.insert(signatures).values(row).returning();
  return inserted;
}

export async function listEntrySignatures(db: Executor, labId: string, entryId: string) {
  return db
    .select()
    .from(signatures)
    .where(and(eq(signatures.labId, labId), eq(signatures.entryId, entryId)))
    .orderBy(desc(signatures.revisionNumber));
}
