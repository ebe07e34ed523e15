// @vitest-environment node
import { describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { signInAttempts } from "@/db/schema";
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

  // Every call gets the same clock reading: how long the password hashes take on a busy
  // machine must not decide whether a delay has passed.
  it("counts parallel guesses one by one: of 12 at once, only the first 3 reach the password", async () => {
    const { members } = await createLabWithMembers(["admin", "researcher"]);
    const now = new Date();
    const guesses = await Promise.all(
      Array.from({ length: 12 }, (_, i) =>
        verifyCredentials(
          getDb(),
          { email: members.researcher.email, password: `wrong-${i}-pw` },
          "guesser",
          now,
        ),
      ),
    );
    expect(guesses.filter((g) => g.kind === "invalid")).toHaveLength(3);
    expect(guesses.filter((g) => g.kind === "throttled")).toHaveLength(9);
    const checked = await getDb()
      .select()
      .from(signInAttempts)
      .where(eq(signInAttempts.email, members.researcher.email.toLowerCase()));
    expect(checked).toHaveLength(3);
    // The guesser's own next try must wait; the member on their own computer signs in at once.
    expect(
      (
        await verifyCredentials(
          getDb(),
          { email: members.researcher.email, password: TEST_PASSWORD },
          "guesser",
          now,
        )
      ).kind,
    ).toBe("throttled");
    expect(
      (
        await verifyCredentials(
          getDb(),
          { email: members.researcher.email, password: TEST_PASSWORD },
          "member-laptop",
          now,
        )
      ).kind,
    ).toBe("ok");
  }, 60_000);

  it("gives a guesser with many clients no lockout: the member waits at most 30 s", async () => {
    const { members } = await createLabWithMembers(["admin", "researcher"]);
    const now = new Date();
    for (let i = 0; i < 20; i += 1) {
      await verifyCredentials(
        getDb(),
        { email: members.researcher.email, password: `x-${i}-wrong` },
        `bot-${i}`,
        now,
      );
    }
    const slowed = await verifyCredentials(
      getDb(),
      { email: members.researcher.email, password: TEST_PASSWORD },
      "member-laptop",
      now,
    );
    expect(slowed).toMatchObject({ kind: "throttled" });
    expect((slowed as { retryAfterSeconds: number }).retryAfterSeconds).toBeLessThanOrEqual(30);
    // Half a minute later the member is in (the guesses stopped).
    const later = new Date(now.getTime() + 31_000);
    expect(
      (
        await verifyCredentials(
          getDb(),
          { email: members.researcher.email, password: TEST_PASSWORD },
          "member-laptop",
          later,
        )
      ).kind,
    ).toBe("ok");
  }, 90_000); // twenty password hashes, one after another, on a busy machine

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
