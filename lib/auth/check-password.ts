import "server-only";
import type { Database } from "@/db/client";
import {
  lockAddressForSignIn,
  recentClientFailures,
  recentSignInAttempts,
  recordSignInAttempt,
} from "@/db/queries/sign-in-attempts";
import { findUserByEmail } from "@/db/queries/users";
import { verifyDecoy, verifyPassword } from "./password";
import { throttleDecision, WINDOW_MS } from "./throttle";

type User = NonNullable<Awaited<ReturnType<typeof findUserByEmail>>>;

export type PasswordCheck =
  | { kind: "throttled"; retryAfterSeconds: number; user: User | null }
  | { kind: "checked"; ok: boolean; user: User | null };

/**
 * One password check against the throttle (lib/auth/throttle.ts), counted atomically: the
 * address is locked for the length of the check, so twelve parallel guesses are counted one
 * after another and only the first few reach the password hash at all. Unknown addresses are
 * checked against a decoy hash so they take as long as known ones.
 */
export async function checkPasswordThrottled(
  db: Database,
  input: { email: string; password: string; clientKey: string },
  now = new Date(),
): Promise<PasswordCheck> {
  return db.transaction(async (tx) => {
    await lockAddressForSignIn(tx, input.email);
    const since = new Date(now.getTime() - WINDOW_MS);
    const [attempts, clientFailures, user] = await Promise.all([
      recentSignInAttempts(tx, input.email, since),
      recentClientFailures(tx, input.clientKey, since),
      findUserByEmail(tx, input.email),
    ]);
    const decision = throttleDecision(attempts, clientFailures, input.clientKey, now);
    if (!decision.allowed)
      return { kind: "throttled", retryAfterSeconds: decision.retryAfterSeconds, user };
    const matches = user
      ? await verifyPassword(user.passwordHash, input.password)
      : await verifyDecoy(input.password);
    const ok = Boolean(user && matches && user.active);
    // Stamped with the same clock the decision used (not the database's transaction start),
    // so the throttle's arithmetic never mixes two clocks.
    await recordSignInAttempt(tx, input.email, input.clientKey, ok, now);
    return { kind: "checked", ok, user };
  });
}
