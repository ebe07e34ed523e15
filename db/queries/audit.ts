import { desc, eq } from "drizzle-orm";
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
