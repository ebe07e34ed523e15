import { and, asc, eq, sql } from "drizzle-orm";
import type { Executor } from "../client";
import { users, type NewUser, type Role } from "../schema";

export async function findUserByEmail(db: Executor, email: string) {
  const rows = await db
    .select()
    .from(users)
    .where(sql`lower(${users.email}) = lower(${email})`)
    .limit(1);
  return rows[0] ?? null;
}

export async function findUserById(db: Executor, id: string) {
  const rows = await db.select().from(users).where(eq(users.id, id)).limit(1);
  return rows[0] ?? null;
}

/** Members of one lab; the lab id is always part of the query. */
export async function listLabMembers(db: Executor, labId: string) {
  return db
    .select({
      id: users.id,
      email: users.email,
      name: users.name,
      role: users.role,
      active: users.active,
      createdAt: users.createdAt,
    })
    .from(users)
    .where(eq(users.labId, labId))
    .orderBy(asc(users.name));
}

export async function findLabMember(db: Executor, labId: string, userId: string) {
  const rows = await db
    .select()
    .from(users)
    .where(and(eq(users.labId, labId), eq(users.id, userId)))
    .limit(1);
  return rows[0] ?? null;
}

export async function insertUser(db: Executor, user: NewUser) {
  const rows = await db.insert(users).values(user).returning();
  return rows[0];
}

export async function updateMemberRole(db: Executor, labId: string, userId: string, role: Role) {
  const rows = await db
    .update(users)
    .set({ role })
    .where(and(eq(users.labId, labId), eq(users.id, userId)))
    .returning();
  return rows[0] ?? null;
}

export async function setMemberActive(
  db: Executor,
  labId: string,
  userId: string,
  active: boolean,
) {
  const rows = await db
    .update(users)
    .set({ active, deactivatedAt: active ? null : new Date() })
    .where(and(eq(users.labId, labId), eq(users.id, userId)))
    .returning();
  return rows[0] ?? null;
}

export async function countActiveAdmins(db: Executor, labId: string) {
  const rows = await db
    .select({ n: sql<number>`count(*)::int` })
    .from(users)
    .where(and(eq(users.labId, labId), eq(users.role, "admin"), eq(users.active, true)));
  return rows[0]?.n ?? 0;
}

/** Active supervisors of a lab, by name: who can be asked to review. */
export async function listLabSupervisors(db: Executor, labId: string) {
  return db
    .select({ id: users.id, name: users.name, email: users.email })
    .from(users)
    .where(and(eq(users.labId, labId), eq(users.role, "supervisor"), eq(users.active, true)))
    .orderBy(asc(users.name));
}

/** Ends every session of the member: tokens carrying the old version no longer count. */
export async function bumpSessionVersion(db: Executor, userId: string) {
  await db
    .update(users)
    .set({ sessionVersion: sql`${users.sessionVersion} + 1` })
    .where(eq(users.id, userId));
}
