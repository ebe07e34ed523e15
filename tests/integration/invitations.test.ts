// @vitest-environment node
import { eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { invitations } from "@/db/schema";
import { verifyCredentials } from "@/lib/auth/verify-credentials";
import { AppError } from "@/lib/errors";
import {
  acceptInvitation,
  inspectInvitation,
  inviteMember,
  withdrawInvitation,
} from "@/lib/labs/invitations";
import { listCaughtMessages } from "@/lib/mail/catcher";
import { hashLinkToken } from "@/lib/labs/tokens";
import { getDb } from "@/lib/server/database";
import { caughtMessagesTo, createLabWithMembers } from "../support/db";

const tokenOf = (link: string) => new URL(link).pathname.split("/").pop()!;

describe("invitations", () => {
  it("mails a link through the mail catcher; accepting it creates the member in the invited role", async () => {
    const { members, lab, tag } = await createLabWithMembers(["admin"]);
    const email = `newcomer.${tag}@lab.example`;
    const { link } = await inviteMember(members.admin, { email, role: "supervisor" });

    const mails = await caughtMessagesTo(email);
    expect(mails).toHaveLength(1);
    expect(mails[0].text).toContain(link);
    expect(mails[0].subject).toContain(lab.name);

    const token = tokenOf(link);
    expect(await inspectInvitation(token)).toMatchObject({
      kind: "open",
      email,
      role: "supervisor",
    });
    await acceptInvitation({
      token,
      email,
      name: "Newcomer Test",
      password: "glassy-carbon-3",
      confirmPassword: "glassy-carbon-3",
    });
    const signedIn = await verifyCredentials(getDb(), { email, password: "glassy-carbon-3" });
    expect(signedIn.kind).toBe("ok");
    if (signedIn.kind === "ok") {
      expect(signedIn.user.role).toBe("supervisor");
      expect(signedIn.user.labId).toBe(lab.id);
    }
  });

  it("refuses a reused link and says why", async () => {
    const { members, tag } = await createLabWithMembers(["admin"]);
    const { link } = await inviteMember(members.admin, {
      email: `twice.${tag}@lab.example`,
      role: "researcher",
    });
    const input = {
      token: tokenOf(link),
      email: `twice.${tag}@lab.example`,
      name: "Twice Test",
      password: "glassy-carbon-3",
      confirmPassword: "glassy-carbon-3",
    };
    await acceptInvitation(input);
    const error = await acceptInvitation(input).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(AppError);
    expect((error as AppError).code).toBe("gone");
    expect((error as AppError).message).toMatch(/already been used/);
    expect(await inspectInvitation(input.token)).toEqual({ kind: "used" });
  });

  it("refuses an expired link and an unknown one", async () => {
    const { members, tag } = await createLabWithMembers(["admin"]);
    const { link } = await inviteMember(members.admin, {
      email: `late.${tag}@lab.example`,
      role: "researcher",
    });
    const token = tokenOf(link);
    await getDb()
      .update(invitations)
      .set({ expiresAt: new Date(Date.now() - 1000) })
      .where(eq(invitations.tokenHash, hashLinkToken(token)));
    expect(await inspectInvitation(token)).toEqual({ kind: "expired" });
    const error = await acceptInvitation({
      token,
      email: `late.${tag}@lab.example`,
      name: "Late Test",
      password: "glassy-carbon-3",
      confirmPassword: "glassy-carbon-3",
    }).catch((e: unknown) => e);
    expect((error as AppError).code).toBe("gone");
    expect(await inspectInvitation("x".repeat(43))).toEqual({ kind: "unknown" });
  });

  it("an invitation works only for whoever knows the address it was sent to", async () => {
    const { members, tag } = await createLabWithMembers(["admin"]);
    const email = `forwarded.${tag}@lab.example`;
    const { link } = await inviteMember(members.admin, { email, role: "researcher" });
    const input = {
      token: tokenOf(link),
      name: "Forwarded Test",
      password: "glassy-carbon-3",
      confirmPassword: "glassy-carbon-3",
    };
    const wrong = await acceptInvitation({ ...input, email: `someone.${tag}@lab.example` }).catch(
      (e: unknown) => e,
    );
    expect((wrong as AppError).code).toBe("invalid_input");
    expect((wrong as AppError).fieldErrors?.email).toEqual([
      "This invitation was sent to a different address.",
    ]);
    expect(await inspectInvitation(input.token)).toMatchObject({ kind: "open" }); // still usable
    await acceptInvitation({ ...input, email: email.toUpperCase() });
    expect(await inspectInvitation(input.token)).toEqual({ kind: "used" });
  });

  it("answers an invitation to another lab's member like any other and mails them a notice, not a link", async () => {
    const home = await createLabWithMembers(["admin"]);
    const elsewhere = await createLabWithMembers(["researcher"]);
    const address = elsewhere.members.researcher.email;
    const answer = await inviteMember(home.members.admin, { email: address, role: "researcher" });
    expect(answer.invitationId).toMatch(/^[0-9a-f-]{36}$/);
    const mails = await caughtMessagesTo(address);
    expect(mails).toHaveLength(1);
    expect(mails[0].text).toContain("already has an Ionleaf account in another lab");
    expect(mails[0].text).not.toContain("/invitations/");
    // The link the admin's side holds cannot make a second account either.
    const error = await acceptInvitation({
      token: tokenOf(answer.link),
      email: address,
      name: "Second Account",
      password: "glassy-carbon-3",
      confirmPassword: "glassy-carbon-3",
    }).catch((e: unknown) => e);
    expect((error as AppError).code).toBe("conflict");
  });

  it("withdraws an open invitation once; again is a conflict, another lab's is not found", async () => {
    const { members, tag } = await createLabWithMembers(["admin"]);
    const other = await createLabWithMembers(["admin"]);
    const { invitationId } = await inviteMember(members.admin, {
      email: `withdrawn.${tag}@lab.example`,
      role: "researcher",
    });
    await withdrawInvitation(members.admin, invitationId);
    const again = await withdrawInvitation(members.admin, invitationId).catch((e: unknown) => e);
    expect((again as AppError).code).toBe("conflict");
    expect((again as AppError).message).toMatch(/already withdrawn/);
    const foreign = await withdrawInvitation(other.members.admin, invitationId).catch(
      (e: unknown) => e,
    );
    expect((foreign as AppError).code).toBe("not_found");
  });

  it("shows an admin only the caught mail of their own lab", async () => {
    const first = await createLabWithMembers(["admin"]);
    const second = await createLabWithMembers(["admin"]);
    await inviteMember(first.members.admin, {
      email: `scoped.${first.tag}@lab.example`,
      role: "researcher",
    });
    await inviteMember(second.members.admin, {
      email: `scoped.${second.tag}@lab.example`,
      role: "researcher",
    });
    const seen = await listCaughtMessages(first.lab.id);
    expect(seen.some((m) => m.to.includes(`scoped.${first.tag}@lab.example`))).toBe(true);
    expect(seen.every((m) => m.labId === first.lab.id)).toBe(true);
    expect(seen.some((m) => m.to.includes(`scoped.${second.tag}@lab.example`))).toBe(false);
  });

  it("only admins invite, and a member of the lab cannot be invited again", async () => {
    const { members } = await createLabWithMembers(["admin", "researcher"]);
    const forbidden = await inviteMember(members.researcher, {
      email: "someone@lab.example",
      role: "admin",
    }).catch((e: unknown) => e);
    expect((forbidden as AppError).code).toBe("forbidden");
    const taken = await inviteMember(members.admin, {
      email: members.researcher.email,
      role: "researcher",
    }).catch((e: unknown) => e);
    expect((taken as AppError).code).toBe("conflict");
    expect((taken as AppError).fieldErrors?.email).toBeDefined();
  });

  it("a second invitation to the same address replaces the first link", async () => {
    const { members, tag } = await createLabWithMembers(["admin"]);
    const email = `again.${tag}@lab.example`;
    const first = await inviteMember(members.admin, { email, role: "researcher" });
    const second = await inviteMember(members.admin, { email, role: "supervisor" });
    expect(await inspectInvitation(tokenOf(first.link))).toEqual({ kind: "revoked" });
    expect(await inspectInvitation(tokenOf(second.link))).toMatchObject({
      kind: "open",
      role: "supervisor",
    });
  });

  it("stores only a hash of the link's token", async () => {
    const { members, tag } = await createLabWithMembers(["admin"]);
    const { link, invitationId } = await inviteMember(members.admin, {
      email: `hash.${tag}@lab.example`,
      role: "researcher",
    });
    const [row] = await getDb().select().from(invitations).where(eq(invitations.id, invitationId));
    expect(row.tokenHash).toBe(hashLinkToken(tokenOf(link)));
    expect(row.tokenHash).not.toContain(tokenOf(link));
  });
});
