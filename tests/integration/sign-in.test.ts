// @vitest-environment node
import { describe, expect, it } from "vitest";
import { MAX_FAILURES } from "@/lib/auth/throttle";
import { verifyCredentials } from "@/lib/auth/verify-credentials";
import { setMemberActivation } from "@/lib/labs/members";
import { getDb } from "@/lib/server/database";
import { createLabWithMembers, TEST_PASSWORD } from "../support/db";

describe("sign-in against the real database", () => {
  it("signs in a member with the right password and carries lab and role", async () => {
    const { members, lab } = await createLabWithMembers(["admin", "researcher"]);
    const result = await verifyCredentials(getDb(), {
      email: members.researcher.email.toUpperCase(),
      password: TEST_PASSWORD,
    });
    expect(result.kind).toBe("ok");
    if (result.kind === "ok") {
      expect(result.user.labId).toBe(lab.id);
      expect(result.user.role).toBe("researcher");
    }
  });

  it("answers the same for a wrong password and an unknown address", async () => {
    const { members } = await createLabWithMembers(["admin", "researcher"]);
    const wrong = await verifyCredentials(getDb(), {
      email: members.researcher.email,
      password: "wrong-password-1",
    });
    const unknown = await verifyCredentials(getDb(), {
      email: "nobody.here@lab.example",
      password: "wrong-password-1",
    });
    expect(wrong).toEqual({ kind: "invalid" });
    expect(unknown).toEqual({ kind: "invalid" });
  });

  it("throttles an address after repeated failures, even with the right password", async () => {
    const { members } = await createLabWithMembers(["admin", "researcher"]);
    for (let i = 0; i < MAX_FAILURES; i += 1) {
      expect(
        (
          await verifyCredentials(getDb(), {
            email: members.researcher.email,
            password: `wrong-${i}-password`,
          })
        ).kind,
      ).toBe("invalid");
    }
    const blocked = await verifyCredentials(getDb(), {
      email: members.researcher.email,
      password: TEST_PASSWORD,
    });
    expect(blocked).toMatchObject({ kind: "throttled" });
    // The window is 15 minutes from the oldest counted failure (lib/auth/throttle.ts).
    expect((blocked as { retryAfterSeconds: number }).retryAfterSeconds).toBeGreaterThan(14 * 60);
    expect((blocked as { retryAfterSeconds: number }).retryAfterSeconds).toBeLessThanOrEqual(
      15 * 60,
    );
    // Another member of the same lab is not affected.
    expect(
      (await verifyCredentials(getDb(), { email: members.admin.email, password: TEST_PASSWORD }))
        .kind,
    ).toBe("ok");
  });

  it("refuses a deactivated member and lets them in again once reactivated", async () => {
    const { members } = await createLabWithMembers(["admin", "researcher"]);
    await setMemberActivation(members.admin, { userId: members.researcher.userId }, false);
    expect(
      await verifyCredentials(getDb(), {
        email: members.researcher.email,
        password: TEST_PASSWORD,
      }),
    ).toEqual({ kind: "invalid" });
    await setMemberActivation(members.admin, { userId: members.researcher.userId }, true);
    expect(
      (
        await verifyCredentials(getDb(), {
          email: members.researcher.email,
          password: TEST_PASSWORD,
        })
      ).kind,
    ).toBe("ok");
  });
});
