import "server-only";
import { insertAuditEvent } from "@/db/queries/audit";
import { listLabOutbox, retryLabMails } from "@/db/queries/outbox";
import { kickOutbox } from "@/lib/mail/outbox";
import { assertCan, type Actor } from "@/lib/rules/authorize";
import { getDb } from "@/lib/server/database";

/** The lab's recent notification mails with their delivery state, for its admins. */
export async function getLabOutbox(actor: Actor) {
  assertCan(actor, "lab.manage");
  const rows = await listLabOutbox(getDb(), actor.labId, 30);
  return rows.map((m) => ({
    id: m.id,
    to: m.to,
    subject: m.subject,
    createdAt: m.createdAt.toISOString(),
    attempts: m.attempts,
    state: m.sentAt ? ("sent" as const) : m.lastError ? ("failing" as const) : ("queued" as const),
    lastError: m.lastError,
    nextAttemptAt: m.sentAt ? null : m.nextAttemptAt.toISOString(),
  }));
}

/** An admin's "retry now" for every unsent mail of the lab. */
export async function retryLabOutbox(actor: Actor): Promise<number> {
  assertCan(actor, "lab.manage");
  const count = await retryLabMails(getDb(), actor.labId);
  await insertAuditEvent(getDb(), {
    labId: actor.labId,
    actorId: actor.userId,
    action: "mail.retry_requested",
    targetType: "lab",
    targetId: actor.labId,
    details: { mails: count },
  });
  kickOutbox();
  return count;
}
