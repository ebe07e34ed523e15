// @vitest-environment node
/**
 * Sessions are revocable on the server: a token carries the member's session version, and
 * sign-out, deactivation and a role change raise it, so every older token stops working.
 */
import { describe, expect, it } from "vitest";
import { findUserById } from "@/db/queries/users";
import { actorForUserId } from "@/lib/access/actor";
import { endSessions } from "@/lib/auth/sign-out";
import { changeMemberRole, setMemberActivation } from "@/lib/labs/members";
import { getDb } from "@/lib/server/database";
import { createLabWithMembers } from "../support/db";

const versionOf = async (userId: string) => (await findUserById(getDb(), userId)).sessionVersion;

describe("revocable sessions", () => {
  it("sign-out ends every session of the member, including a copied token", async () => {
    const { members } = await createLabWithMembers(["admin", "researcher"]);
    const token = await versionOf(members.researcher.userId);
    expect(await actorForUserId(members.researcher.userId, token)).not.toBeNull();
    await endSessions(members.researcher);
    expect(await actorForUserId(members.researcher.userId, token)).toBeNull();
    expect(await actorForUserId(members.researcher.userId, token + 1)).not.toBeNull();
  });

  it("a role change and a deactivation end the member's sessions", async () => {
    const { members } = await createLabWithMembers(["admin", "researcher", "researcher"]);
    const first = await versionOf(members.researcher.userId);
    await changeMemberRole(members.admin, {
      userId: members.researcher.userId,
      role: "supervisor",
    });
    expect(await actorForUserId(members.researcher.userId, first)).toBeNull();
    const second = await versionOf(members.researcher2.userId);
    await setMemberActivation(members.admin, { userId: members.researcher2.userId }, false);
    expect(await actorForUserId(members.researcher2.userId, second)).toBeNull();
  });
});
