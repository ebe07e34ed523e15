import type { Role } from "@/db/schema/enums";
import { AppError } from "@/lib/errors";
import { roleCan, type Permission } from "./role-permissions";

/** The signed-in member as every server-side decision sees them, reloaded from the database. */
export interface Actor {
  userId: string;
  labId: string;
  role: Role;
  name: string;
  email: string;
}

export function assertCan(actor: Actor, permission: Permission): void {
  if (!roleCan(actor.role, permission)) {
    throw new AppError("forbidden", "Your role in this lab does not allow that.");
  }
}
