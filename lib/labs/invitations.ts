import "server-only";
import { insertAuditEvent } from "@/db/queries/audit";
import {
  findInvitationByTokenHash,
  findInvitationInLab,
  insertInvitation,
  markInvitationAccepted,
  revokeInvitation,
  revokeOpenInvitationsFor,
} from "@/db/queries/invitations";
import { findLabById } from "@/db/queries/labs";
import { findUserByEmail, insertUser } from "@/db/queries/users";
import type { Role } from "@/db/schema/enums";
import { assertCan, type Actor } from "@/lib/rules/authorize";
import { hashPassword } from "@/lib/auth/password";
import { getEnv } from "@/lib/env";
import { AppError } from "@/lib/errors";
import { sendMail } from "@/lib/mail/transport";
import { alreadyRegisteredMail, invitationMail } from "@/lib/mail/templates";
import { getDb } from "@/lib/server/database";
import { acceptInvitationSchema, inviteMemberSchema } from "@/lib/validation/auth";
import { parseInput } from "@/lib/validation/parse";
import { hashLinkToken, newLinkToken } from "./tokens";

const INVITATION_LIFETIME_MS = 7 * 24 * 60 * 60 * 1000;

/**
 * Invites a person by e-mail; the link goes only into the mail, its hash into the database.
 * An address that already has an account in another lab gets the same answer on screen (the
 * admin must not learn who is a member elsewhere) and a notice by mail instead of a link;
 * the open invitation it leaves can never be accepted and expires like any other.
 */
export async function inviteMember(
  actor: Actor,
  raw: unknown,
): Promise<{ invitationId: string; link: string }> {
  assertCan(actor, "lab.manage");
  const { email, role } = parseInput(inviteMemberSchema, raw);
  const db = getDb();
  const existing = await findUserByEmail(db, email);
  if (existing?.labId === actor.labId) {
    throw new AppError("conflict", "That person is already a member of this lab.", {
      fieldErrors: { email: ["Already a member of this lab."] },
    });
  }
  const lab = await findLabById(db, actor.labId);
  if (!lab) throw new AppError("not_found", "Lab not found.");
  const { token, tokenHash } = newLinkToken();
  const expiresAt = new Date(Date.now() + INVITATION_LIFETIME_MS);
  const link = new URL(`/invitations/${token}`, getEnv().APP_URL).toString();

  const invitation = await db.transaction(async (tx) => {
    await revokeOpenInvitationsFor(tx, actor.labId, email); // the newest link is the only one that works
    const row = await insertInvitation(tx, {
      labId: actor.labId,
      email,
      role,
      tokenHash,
      invitedById: actor.userId,
      expiresAt,
    });
    await insertAuditEvent(tx, {
      labId: actor.labId,
      actorId: actor.userId,
      action: "invitation.sent",
      targetType: "invitation",
      targetId: row.id,
      details: { email, role },
    });
    return row;
  });
  // Sent after the commit: a mail for an invitation that was rolled back would be a dead link.
  await sendMail({
    to: email,
    labId: actor.labId,
    ...(existing
      ? alreadyRegisteredMail({ labName: lab.name, inviterName: actor.name })
      : invitationMail({ labName: lab.name, inviterName: actor.name, role, link, expiresAt })),
  });
  return { invitationId: invitation.id, link };
}

export type InvitationState =
  | { kind: "open"; email: string; role: Role; labName: string }
  | { kind: "unknown" | "used" | "expired" | "revoked" };

/** What the acceptance page shows for a link, without changing anything. */
export async function inspectInvitation(token: string): Promise<InvitationState> {
  const found = await findInvitationByTokenHash(getDb(), hashLinkToken(token));
  if (!found) return { kind: "unknown" };
  const { invitation, labName } = found;
  if (invitation.acceptedAt) return { kind: "used" };
  if (invitation.revokedAt) return { kind: "revoked" };
  if (invitation.expiresAt.getTime() <= Date.now()) return { kind: "expired" };
  return { kind: "open", email: invitation.email, role: invitation.role, labName };
}

const STATE_MESSAGES = {
  unknown: "This invitation link is not valid. Ask your lab admin for a new one.",
  used: "This invitation has already been used. Sign in with the password you chose.",
  expired: "This invitation has expired. Ask your lab admin to send a new one.",
  revoked: "This invitation was withdrawn by your lab admin.",
} as const;

export function invitationStateMessage(kind: keyof typeof STATE_MESSAGES): string {
  return STATE_MESSAGES[kind];
}

/** Creates the member and closes the invitation in one transaction. */
export async function acceptInvitation(raw: unknown): Promise<{ userId: string; email: string }> {
  const input = parseInput(acceptInvitationSchema, raw);
  const state = await inspectInvitation(input.token);
  if (state.kind !== "open") throw new AppError("gone", invitationStateMessage(state.kind));
  // The link alone is not enough: whoever follows it must also know the address it was sent
  // to, so a forwarded or leaked link does not make an account for someone else.
  if (state.email.toLowerCase() !== input.email.toLowerCase()) {
    throw new AppError("invalid_input", "Check the e-mail address.", {
      fieldErrors: { email: ["This invitation was sent to a different address."] },
    });
  }
  const passwordHash = await hashPassword(input.password);
  const db = getDb();
  return db.transaction(async (tx) => {
    const found = await findInvitationByTokenHash(tx, hashLinkToken(input.token));
    if (!found) throw new AppError("gone", invitationStateMessage("unknown"));
    const { invitation } = found;
    if (await findUserByEmail(tx, invitation.email))
      throw new AppError(
        "conflict",
        "An account with this e-mail already exists. Sign in instead.",
      );
    const user = await insertUser(tx, {
      labId: invitation.labId,
      email: invitation.email,
      name: input.name,
      passwordHash,
      role: invitation.role,
    });
    if (!(await markInvitationAccepted(tx, invitation.id, user.id))) {
      throw new AppError("gone", invitationStateMessage("used")); // rolls back the new user too
    }
    await insertAuditEvent(tx, {
      labId: invitation.labId,
      actorId: user.id,
      action: "invitation.accepted",
      targetType: "invitation",
      targetId: invitation.id,
    });
    return { userId: user.id, email: user.email };
  });
}

export async function withdrawInvitation(actor: Actor, invitationId: string): Promise<void> {
  assertCan(actor, "lab.manage");
  const done = await revokeInvitation(getDb(), actor.labId, invitationId);
  if (!done) {
    const found = await findInvitationInLab(getDb(), actor.labId, invitationId);
    if (!found) throw new AppError("not_found", "Invitation not found.");
    throw new AppError(
      "conflict",
      found.acceptedAt
        ? "That invitation was already accepted."
        : "That invitation was already withdrawn.",
    );
  }
  await insertAuditEvent(getDb(), {
    labId: actor.labId,
    actorId: actor.userId,
    action: "invitation.revoked",
    targetType: "invitation",
    targetId: invitationId,
  });
}
