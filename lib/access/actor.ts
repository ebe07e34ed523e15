import "server-only";
import { cache } from "react";
import { findUserById } from "@/db/queries/users";
import { sessionClaims } from "@/lib/auth/session-claims";
import { AppError } from "@/lib/errors";
import { getDb } from "@/lib/server/database";
import type { Actor } from "@/lib/rules/authorize";

export { assertCan, type Actor } from "@/lib/rules/authorize";

/**
 * Resolves a session to an Actor; null when the member is unknown or deactivated, or when the
 * session was ended (its version is older than the member's: signed out, role changed…).
 */
export async function actorForUserId(
  userId: string,
  sessionVersion?: number,
): Promise<Actor | null> {
  const user = await findUserById(getDb(), userId);
  if (!user || !user.active) return null;
  if (sessionVersion !== undefined && sessionVersion !== user.sessionVersion) return null;
  return {
    userId: user.id,
    labId: user.labId,
    role: user.role,
    name: user.name,
    email: user.email,
  };
}

/** Once per request: the session's member, or null. */
export const getActor = cache(async (): Promise<Actor | null> => {
  const claims = await sessionClaims();
  return claims ? actorForUserId(claims.userId, claims.sessionVersion) : null;
});

export async function requireActor(): Promise<Actor> {
  const actor = await getActor();
  if (!actor) throw new AppError("unauthenticated", "Please sign in again.");
  return actor;
}
