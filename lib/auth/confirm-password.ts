import "server-only";
import type { Executor } from "@/db/client";
import { recentSignInAttempts, recordSignInAttempt } from "@/db/queries/sign-in-attempts";
import { findUserById } from "@/db/queries/users";
import { AppError } from "@/lib/errors";
import type { Actor } from "@/lib/rules/authorize";
import { verifyPassword } from "./password";
import { throttleDecision, WINDOW_MS } from "./throttle";

/**
 * Re-entry of the signed-in member's own password, as an electronic signature asks. It
 * counts toward the same throttle as signing in: a wrong password here is a failed attempt
 * for that address, and a throttled address cannot sign either.
 */
export async function confirmPassword(db: Executor, actor: Actor, password: string): Promise<void> {
  const attempts = await recentSignInAttempts(db, actor.email, new Date(Date.now() - WINDOW_MS));
  const decision = throttleDecision(attempts, new Date());
  if (!decision.allowed) {
    throw new AppError(
      "rate_limited",
      `Too many wrong passwords. Try again in ${Math.ceil(decision.retryAfterSeconds / 60)} min.`,
      { details: { retryAfterSeconds: decision.retryAfterSeconds } },
    );
  }
  const user = await findUserById(db, actor.userId);
  const ok = Boolean(user?.active && (await verifyPassword(user.passwordHash, password)));
  await recordSignInAttempt(db, actor.email, ok);
  if (!ok) {
    throw new AppError("invalid_input", "That password is not yours; nothing was signed.", {
      fieldErrors: { password: ["Enter your own password."] },
    });
  }
}
