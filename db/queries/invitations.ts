import { and, desc, eq, isNull, sql } from "drizzle-orm";
import type { Executor } from "../client";
import { invitations, labs, users, type NewInvitation } from "../schema";

export async function insertInvitation(db: Executor, invitation: NewInvitation) {
  const rows = await db.insert(invitations).values(invitation).returning();
  return rows[0];
}

/** The invitation a link points to, with the lab's name for the acceptance page. */
export async function findInvitationByTokenHash(db: Executor, tokenHash: string) {
  const rows = await db
    .select({ invitation: invitations, labName: labs.name })
    .from(invitations)
    .innerJoin(labs, eq(labs.id, invitations.labId))
    .where(eq(invitations.tokenHash, tokenHash))
    .limit(1);
  return rows[0] ?? null;
}

/**
 * Marks an invitation accepted only if it still is open: the WHERE clause makes two
 * concurrent acceptances of one link impossible (the second updates nothing).
 */
export async function markInvitationAccepted(db: Executor, id: string, userId: string) {
  const rows = await db
    .update(invitations)
    .set({ acceptedAt: new Date(), acceptedUserId: userId })
    .where(
      and(
        eq(invitations.id, id),
        isNull(invitations.acceptedAt),
        isNull(invitations.revokedAt),
        sql`${invitations.expiresAt} > now()`,
      ),
    )
    .returning({ id: invitations.id });
  return rows.length === 1;
}

export async function listOpenInvitations(db: Executor, labId: string) {
  return db
    .select({
      id: invitations.id,
      email: invitations.email,
      role: invitations.role,
      expiresAt: invitations.expiresAt,
      createdAt: invitations.createdAt,
      invitedBy: users.name,
    })
    .from(invitations)
    .innerJoin(users, eq(users.id, invitations.invitedById))
    .where(
      and(
        eq(invitations.labId, labId),
        isNull(invitations.acceptedAt),
        isNull(invitations.revokedAt),
        sql`${invitations.expiresAt} > now()`,
      ),
    )
    .orderBy(desc(invitations.createdAt));
}

/** Withdraws an invitation that is still open; false when it was used or withdrawn already. */
export async function revokeInvitation(db: Executor, labId: string, id: string) {
  const rows = await db
    .update(invitations)
    .set({ revokedAt: new Date() })
    .where(
      and(
        eq(invitations.labId, labId),
        eq(invitations.id, id),
        isNull(invitations.acceptedAt),
        isNull(invitations.revokedAt),
      ),
    )
    .returning({ id: invitations.id });
  return rows.length === 1;
}

export async function findInvitationInLab(db: Executor, labId: string, id: string) {
  const rows = await db
    .select()
    .from(invitations)
    .where(and(eq(invitations.labId, labId), eq(invitations.id, id)))
    .limit(1);
  return rows[0] ?? null;
}

/** A new invitation replaces any open one for the same address in the lab. */
export async function revokeOpenInvitationsFor(db: Executor, labId: string, email: string) {
  await db
    .update(invitations)
    .set({ revokedAt: new Date() })
    .where(
      and(
        eq(invitations.labId, labId),
        sql`lower(${invitations.email}) = lower(${email})`,
        isNull(invitations.acceptedAt),
        isNull(invitations.revokedAt),
      ),
    );
}
