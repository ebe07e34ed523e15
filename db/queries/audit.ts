import { and, count, desc, eq, gte, lt, lte, type SQL } from "drizzle-orm";
import type { Executor } from "../client";
import { auditEvents, users } from "../schema";

export interface AuditRecord {
  labId: string | null;
  actorId: string | null;
  action: string;
  targetType: string;
  targetId?: string | null;
  details?: Record<string, unknown>;
}

export async function insertAuditEvent(db: Executor, record: AuditRecord) {
  await db.insert(auditEvents).values({ ...record, details: record.details ?? {} });
}

export async function listAuditEvents(db: Executor, labId: string, limit = 50) {
  return db
    .select({
      id: auditEvents.id,
      action: auditEvents.action,
      targetType: auditEvents.targetType,
      targetId: auditEvents.targetId,
      at: auditEvents.at,
      details: auditEvents.details,
      actorName: users.name,
    })
    .from(auditEvents)
    .leftJoin(users, eq(users.id, auditEvents.actorId))
    .where(eq(auditEvents.labId, labId))
    .orderBy(desc(auditEvents.at), desc(auditEvents.id))
    .limit(limit);
}

export interface AuditFilter {
  labId: string;
  actorId?: string;
  action?: string;
  entryId?: string;
  from?: Date;
  /** Exclusive. */
  to?: Date;
}

function whereOf(f: AuditFilter): SQL | undefined {
  const where: SQL[] = [eq(auditEvents.labId, f.labId)];
  if (f.actorId) where.push(eq(auditEvents.actorId, f.actorId));
  if (f.action) where.push(eq(auditEvents.action, f.action));
  if (f.entryId) where.push(eq(auditEvents.targetId, f.entryId));
  if (f.from) where.push(gte(auditEvents.at, f.from));
  if (f.to) where.push(lt(auditEvents.at, f.to));
  return and(...where);
}

const AUDIT_COLUMNS = {
  id: auditEvents.id,
  at: auditEvents.at,
  action: auditEvents.action,
  targetType: auditEvents.targetType,
  targetId: auditEvents.targetId,
  details: auditEvents.details,
  actorName: users.name,
  actorEmail: users.email,
};

/** One page of the lab's audit trail, newest first, and the total count. */
export async function searchAuditEvents(
  db: Executor,
  f: AuditFilter,
  limit: number,
  offset: number,
) {
  const [rows, [{ total }]] = await Promise.all([
    db
      .select(AUDIT_COLUMNS)
      .from(auditEvents)
      .leftJoin(users, eq(users.id, auditEvents.actorId))
      .where(whereOf(f))
      .orderBy(desc(auditEvents.id))
      .limit(limit)
      .offset(offset),
    db.select({ total: count() }).from(auditEvents).where(whereOf(f)),
  ]);
  return { rows, total };
}

/** A batch of the trail older than a given id (keyset paging, for streaming exports). */
export async function auditBatchBefore(
  db: Executor,
  f: AuditFilter,
  beforeId: number | null,
  limit: number,
) {
  const where = whereOf(f);
  return db
    .select(AUDIT_COLUMNS)
    .from(auditEvents)
    .leftJoin(users, eq(users.id, auditEvents.actorId))
    .where(beforeId === null ? where : and(where, lte(auditEvents.id, beforeId - 1)))
    .orderBy(desc(auditEvents.id))
    .limit(limit);
}

/** Actions that occur in a lab's trail, for the filter's choices. */
export async function listAuditActions(db: Executor, labId: string) {
  const rows = await db
    .selectDistinct({ action: auditEvents.action })
    .from(auditEvents)
    .where(eq(auditEvents.labId, labId))
    .orderBy(auditEvents.action);
  return rows.map((r) => r.action);
}
