import { and, desc, eq, isNull, lte, sql } from "drizzle-orm";
import type { Executor } from "../client";
import { mailOutbox } from "../schema";

export async function insertOutboxMails(db: Executor, rows: (typeof mailOutbox.$inferInsert)[]) {
  if (rows.length) await db.insert(mailOutbox).values(rows);
}

/**
 * Claims mails that are due, locking them so that two servers never send the same mail;
 * rows another transaction holds are skipped, not waited for.
 */
export async function claimDueMails(db: Executor, now: Date, limit: number, maxAttempts: number) {
  return db
    .select()
    .from(mailOutbox)
    .where(
      and(
        isNull(mailOutbox.sentAt),
        lte(mailOutbox.nextAttemptAt, now),
        sql`${mailOutbox.attempts} < ${maxAttempts}`,
      ),
    )
    .orderBy(mailOutbox.nextAttemptAt)
    .limit(limit)
    .for("update", { skipLocked: true });
}

export async function markMailSent(db: Executor, id: number) {
  await db
    .update(mailOutbox)
    .set({ sentAt: new Date(), lastError: null, attempts: sql`${mailOutbox.attempts} + 1` })
    .where(eq(mailOutbox.id, id));
}

export async function markMailFailed(db: Executor, id: number, error: string, nextAttemptAt: Date) {
  await db
    .update(mailOutbox)
    .set({ lastError: error, nextAttemptAt, attempts: sql`${mailOutbox.attempts} + 1` })
    .where(eq(mailOutbox.id, id));
}

/** Makes a lab's unsent mails due now (an admin's "retry now"). */
export async function retryLabMails(db: Executor, labId: string) {
  const rows = await db
    .update(mailOutbox)
    .set({ nextAttemptAt: new Date(), attempts: 0 })
    .where(and(eq(mailOutbox.labId, labId), isNull(mailOutbox.sentAt)))
    .returning({ id: mailOutbox.id });
  return rows.length;
}

export async function listLabOutbox(db: Executor, labId: string, limit = 50) {
  return db
    .select()
    .from(mailOutbox)
    .where(eq(mailOutbox.labId, labId))
    .orderBy(desc(mailOutbox.createdAt), desc(mailOutbox.id))
    .limit(limit);
}
