import "server-only";
import { insertAuditEvent } from "@/db/queries/audit";
import type { Actor } from "@/lib/rules/authorize";
import { getDb } from "@/lib/server/database";

/** Records a member's sign-out in the lab's audit trail. */
export async function recordSignOut(actor: Actor): Promise<void> {
  await insertAuditEvent(getDb(), {
    labId: actor.labId,
    actorId: actor.userId,
    action: "auth.signed_out",
    targetType: "user",
    targetId: actor.userId,
  });
}
