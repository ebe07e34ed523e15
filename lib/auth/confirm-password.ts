import "server-only";
import type { Database } from "@/db/client";
import { AppError } from "@/lib/errors";
import type { Actor } from "@/lib/rules/authorize";
import { checkPasswordThrottled } from "./check-password";

/**
 * Re-entry of the signed-in member's own password, as an electronic signature asks. It counts
 * toward the same throttle as signing in: a wrong password here is a failed attempt for that
 * address, and a throttled address cannot sign either.
 */
export async function confirmPassword(db: Database, actor: Actor, password: string): Promise<void> {
  const check = await checkPasswordThrottled(db, {
    email: actor.email,
    password,
    clientKey: `signature:${actor.userId}`,
  });
  if (check.kind === "throttled") {
    throw new AppError(
      "rate_limited",
      `Too many wrong passwords. Try again in ${Math.ceil(check.retryAfterSeconds / 60)} min.`,
      { details: { retryAfterSeconds: check.retryAfterSeconds } },
    );
  }
  if (!check.ok || check.user?.id !== actor.userId) {
    throw new AppError("invalid_input", "That password is not yours; nothing was signed.", {
      fieldErrors: { password: ["Enter your own password."] },
    });
  }
}
