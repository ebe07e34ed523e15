import "server-only";
import type { Database } from "@/db/client";
import { insertAuditEvent } from "@/db/queries/audit";
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
  const user = await findUserByEmail(db, email);
  // The audit trail of a known member's lab records every attempt (never the password).
  const audit = (action: string, details: Record<string, unknown> = {}) =>
    insertAuditEvent(db, {
      labId: user?.labId ?? null,
      actorId: user?.id ?? null,
      action,
      targetType: "user",
      targetId: user?.id ?? null,
      details: { email, ...details },
    });
  if (!decision.allowed) {
    await audit("auth.sign_in_throttled", { retryAfterSeconds: decision.retryAfterSeconds });
    return { kind: "throttled", retryAfterSeconds: decision.retryAfterSeconds };
  }

  const passwordOk = user
    ? await verifyPassword(user.passwordHash, password)
    : await verifyDecoy(password);
  const ok = Boolean(user && passwordOk && user.active);
  await recordSignInAttempt(db, email, ok);
  await audit(ok ? "auth.signed_in" : "auth.sign_in_failed");
  if (!ok || !user) return { kind: "invalid" };
  return {
    kind: "ok",
    user: { id: user.id, email: user.email, name: user.name, labId: user.labId, role: user.role },
  };
}
