import "server-only";
import type { Database } from "@/db/client";
import { findUserByEmail } from "@/db/queries/users";
import { recentSignInAttempts, recordSignInAttempt } from "@/db/queries/sign-in-attempts";
import { signInSchema } from "@/lib/validation/auth";
import { verifyDecoy, verifyPassword } from "./password";
import { throttleDecision, WINDOW_MS } from "./throttle";

export type CredentialsResult =
  | { kind: "ok"; user: { id: string; email: string; name: string; labId: string; role: string } }
  | { kind: "invalid" }
  | { kind: "throttled"; retryAfterSeconds: number };

/**
 * The sign-in use case behind the credentials provider. A wrong password, an unknown
 * address and a deactivated member all answer "invalid", so a stranger learns nothing
 * about who has an account.
 */
export async function verifyCredentials(
  db: Database,
  raw: unknown,
  now = new Date(),
): Promise<CredentialsResult> {
  const parsed = signInSchema.safeParse(raw);
  if (!parsed.success) return { kind: "invalid" };
  const { email, password } = parsed.data;

  const attempts = await recentSignInAttempts(db, email, new Date(now.getTime() - WINDOW_MS));
  const decision = throttleDecision(attempts, now);
  if (!decision.allowed)
    return { kind: "throttled", retryAfterSeconds: decision.retryAfterSeconds };

  const user = await findUserByEmail(db, email);
  const passwordOk = user
    ? await verifyPassword(user.passwordHash, password)
    : await verifyDecoy(password);
  const ok = Boolean(user && passwordOk && user.active);
  await recordSignInAttempt(db, email, ok);
  if (!ok || !user) return { kind: "invalid" };
  return {
    kind: "ok",
    user: { id: user.id, email: user.email, name: user.name, labId: user.labId, role: user.role },
  };
}
