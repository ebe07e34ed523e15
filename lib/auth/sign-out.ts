import "server-only";
import { insertAuditEvent } from "@/db/queries/audit";
import { bumpSessionVersion } from "@/db/queries/users";
import type { Actor } from "@/lib/rules/authorize";
import { getDb } from "@/lib/server/database";

/**
 * Signing out ends the member's sessions on the server, not only the cookie in this browser:
 * a copied or stolen token stops working too. Recorded in the lab's audit trail.
 */
export async function endSessions(actor: Actor): Promise<void> {
  await getDb().transaction(async (tx) => {
    await bumpSessionVersion(tx, actor.userId);
    await insertAuditEvent(tx, {
      labId: actor.labId,
      actorId: actor.userId,
      action: "auth.signed_out",
      targetType: "user",
      targetId: actor.userId,
    });
  });
}
