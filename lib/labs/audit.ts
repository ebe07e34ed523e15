import "server-only";
import { listAuditEvents } from "@/db/queries/audit";
import { assertCan, type Actor } from "@/lib/rules/authorize";
import { getDb } from "@/lib/server/database";

export async function listRecentAudit(actor: Actor, limit = 30) {
  assertCan(actor, "lab.manage");
  return listAuditEvents(getDb(), actor.labId, limit);
}
