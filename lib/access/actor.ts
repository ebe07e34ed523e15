import "server-only";
import { cache } from "react";
import { findUserById } from "@/db/queries/users";
import type { Role } from "@/db/schema/enums";
import { auth } from "@/lib/auth";
import { AppError } from "@/lib/errors";
import { getDb } from "@/lib/server/database";
import { roleCan, type Permission } from "./policy";

/** The signed-in member as every server-side decision sees them, reloaded from the database. */
export interface Actor {
  userId: string;
  labId: string;
  role: Role;
  name: string;
  email: string;
}

/** Resolves a session user id to an Actor; null when the member is unknown or deactivated. */
export async function actorForUserId(userId: string): Promise<Actor | null> {
  const user = await findUserById(getDb(), userId);
  if (!user || !user.active) return null;
  return { userId: user.id, labId: user.labId, role: user.role as Role, name: user.name, email: user.email };
}

/** Once per request: the session's member, or null. */
export const getActor = cache(async (): Promise<Actor | null> => {
  const session = await auth();
  const userId = session?.user?.id;
  return userId ? actorForUserId(userId) : null;
});

export async function requireActor(): Promise<Actor> {
  const actor = await getActor();
  if (!actor) throw new AppError("unauthenticated", "Please sign in again.");
  return actor;
}

export function assertCan(actor: Actor, permission: Permission): void {
  if (!roleCan(actor.role, permission)) {
    throw new AppError("forbidden", "Your role in this lab does not allow that.");
  }
}

/** Lab data belongs to one lab: anything else is reported as not found, not as forbidden. */
export function assertSameLab(actor: Actor, labId: string | null | undefined): void {
  if (!labId || labId !== actor.labId) throw new AppError("not_found", "Not found.");
}
