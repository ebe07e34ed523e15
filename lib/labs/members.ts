import "server-only";
import { insertAuditEvent } from "@/db/queries/audit";
import { findLabById } from "@/db/queries/labs";
import {
  countActiveAdmins,
  findLabMember,
  listLabMembers,
  bumpSessionVersion,
  setMemberActive,
  updateMemberRole,
} from "@/db/queries/users";
import { listOpenInvitations } from "@/db/queries/invitations";
import type { Role } from "@/db/schema/enums";
import { assertCan, type Actor } from "@/lib/rules/authorize";
import { AppError } from "@/lib/errors";
import { getDb } from "@/lib/server/database";
import { changeRoleSchema, memberIdSchema } from "@/lib/validation/auth";
import { parseInput } from "@/lib/validation/parse";

export interface MemberDto {
  id: string;
  email: string;
  name: string;
  role: Role;
  active: boolean;
}

function toMemberDto(row: {
  id: string;
  email: string;
  name: string;
  role: string;
  active: boolean;
}): MemberDto {
  return {
    id: row.id,
    email: row.email,
    name: row.name,
    role: row.role as Role,
    active: row.active,
  };
}

export async function listMembers(actor: Actor): Promise<MemberDto[]> {
  assertCan(actor, "lab.read");
  const rows = await listLabMembers(getDb(), actor.labId);
  return rows.map(toMemberDto);
}

export async function listPendingInvitations(actor: Actor) {
  assertCan(actor, "lab.manage");
  return listOpenInvitations(getDb(), actor.labId);
}

export async function getLabName(actor: Actor): Promise<string> {
  assertCan(actor, "lab.read");
  return (await findLabById(getDb(), actor.labId))?.name ?? "";
}

export async function changeMemberRole(actor: Actor, raw: unknown): Promise<MemberDto> {
  assertCan(actor, "lab.manage");
  const { userId, role } = parseInput(changeRoleSchema, raw);
  return getDb().transaction(async (tx) => {
    const member = await findLabMember(tx, actor.labId, userId);
    if (!member) throw new AppError("not_found", "That person is not a member of your lab.");
    if (
      member.role === "admin" &&
      role !== "admin" &&
      (await countActiveAdmins(tx, actor.labId)) <= 1
    ) {
      throw new AppError(
        "conflict",
        "A lab needs at least one active admin. Make someone else admin first.",
      );
    }
    const updated = await updateMemberRole(tx, actor.labId, userId, role);
    // A new role starts with a new sign-in: existing sessions end.
    if (updated) await bumpSessionVersion(tx, userId);
    if (!updated) throw new AppError("not_found", "That person is not a member of your lab.");
    await insertAuditEvent(tx, {
      labId: actor.labId,
      actorId: actor.userId,
      action: "member.role_changed",
      targetType: "user",
      targetId: userId,
      details: { from: member.role, to: role },
    });
    return toMemberDto(updated);
  });
}

export async function setMemberActivation(
  actor: Actor,
  raw: unknown,
  active: boolean,
): Promise<MemberDto> {
  assertCan(actor, "lab.manage");
  const { userId } = parseInput(memberIdSchema, raw);
  if (!active && userId === actor.userId)
    throw new AppError("conflict", "You cannot deactivate yourself.");
  return getDb().transaction(async (tx) => {
    const member = await findLabMember(tx, actor.labId, userId);
    if (!member) throw new AppError("not_found", "That person is not a member of your lab.");
    if (
      !active &&
      member.role === "admin" &&
      member.active &&
      (await countActiveAdmins(tx, actor.labId)) <= 1
    ) {
      throw new AppError("conflict", "A lab needs at least one active admin.");
    }
    const updated = await setMemberActive(tx, actor.labId, userId, active);
    if (updated && !active) await bumpSessionVersion(tx, userId);
    if (!updated) throw new AppError("not_found", "That person is not a member of your lab.");
    await insertAuditEvent(tx, {
      labId: actor.labId,
      actorId: actor.userId,
      action: active ? "member.reactivated" : "member.deactivated",
      targetType: "user",
      targetId: userId,
    });
    return toMemberDto(updated);
  });
}
