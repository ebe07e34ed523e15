// @vitest-environment node
import { describe, expect, it } from "vitest";
import { listAuditEvents } from "@/db/queries/audit";
import { findUserById } from "@/db/queries/users";
import { actorForUserId } from "@/lib/access/actor";
import { AppError } from "@/lib/errors";
import { changeMemberRole, listMembers, setMemberActivation } from "@/lib/labs/members";
import { getDb } from "@/lib/server/database";
import { createLabWithMembers } from "../support/db";

async function expectAppError(promise: Promise<unknown>, code: string) {
  const error = await promise.then(
    () => null,
    (e: unknown) => e,
  );
  expect(error).toBeInstanceOf(AppError);
  expect((error as AppError).code).toBe(code);
}

describe("role changes and deactivation", () => {
  it("lets an admin change a member's role, takes effect at once and is audited", async () => {
    const { members } = await createLabWithMembers();
    const updated = await changeMemberRole(members.admin, {
      userId: members.researcher.userId,
      role: "supervisor",
    });
    expect(updated.role).toBe("supervisor");
    // The next request sees the new role: the actor is reloaded from the database.
    expect((await actorForUserId(members.researcher.userId))?.role).toBe("supervisor");
    const events = await listAuditEvents(getDb(), members.admin.labId);
    const change = events.filter((e) => e.action === "member.role_changed");
    expect(change).toHaveLength(1);
    expect(change[0]).toMatchObject({
      actorName: members.admin.name,
      targetType: "user",
      targetId: members.researcher.userId,
      details: { from: "researcher", to: "supervisor" },
    });
  });

  it("refuses role changes by researchers and supervisors", async () => {
    const { members } = await createLabWithMembers();
    await expectAppError(
      changeMemberRole(members.researcher, { userId: members.researcher.userId, role: "admin" }),
      "forbidden",
    );
    await expectAppError(
      changeMemberRole(members.supervisor, { userId: members.researcher.userId, role: "admin" }),
      "forbidden",
    );
  });

  it("keeps at least one active admin", async () => {
    const { members } = await createLabWithMembers(["admin", "researcher"]);
    await expectAppError(
      changeMemberRole(members.admin, { userId: members.admin.userId, role: "researcher" }),
      "conflict",
    );
    await expectAppError(
      setMemberActivation(members.admin, { userId: members.admin.userId }, false),
      "conflict",
    );
  });

  it("deactivates a member: no actor any more, but the account row (and their work) stays", async () => {
    const { members } = await createLabWithMembers();
    await setMemberActivation(members.admin, { userId: members.researcher.userId }, false);
    expect(await actorForUserId(members.researcher.userId)).toBeNull();
    const row = await findUserById(getDb(), members.researcher.userId);
    expect(row?.active).toBe(false);
    expect(row?.deactivatedAt).toBeInstanceOf(Date);
  });

  it("rejects bad input by field", async () => {
    const { members } = await createLabWithMembers();
    const error = await changeMemberRole(members.admin, { userId: "nope", role: "owner" }).catch(
      (e: unknown) => e,
    );
    expect((error as AppError).code).toBe("invalid_input");
    expect(Object.keys((error as AppError).fieldErrors ?? {}).sort()).toEqual(["role", "userId"]);
  });
});

describe("cross-lab denial", () => {
  it("never lets one lab read or change another lab's members", async () => {
    const a = await createLabWithMembers();
    const b = await createLabWithMembers();
    const seenByB = await listMembers(b.members.admin);
    expect(seenByB.map((m) => m.id)).not.toContain(a.members.researcher.userId);
    await expectAppError(
      changeMemberRole(b.members.admin, { userId: a.members.researcher.userId, role: "admin" }),
      "not_found",
    );
    await expectAppError(
      setMemberActivation(b.members.admin, { userId: a.members.researcher.userId }, false),
      "not_found",
    );
    expect((await findUserById(getDb(), a.members.researcher.userId))?.role).toBe("researcher");
  });
});
