import "server-only";
import type { Database } from "@/db/client";
import { insertAuditEvent } from "@/db/queries/audit";
import { signInSchema } from "@/lib/validation/auth";
import { checkPasswordThrottled } from "./check-password";

export type CredentialsResult =
  | {
      kind: "ok";
      user: {
        id: string;
        email: string;
        name: string;
        labId: string;
        role: string;
        sessionVersion: number;
      };
    }
  | { kind: "invalid" }
  | { kind: "throttled"; retryAfterSeconds: number };

/**
 * The sign-in use case behind the credentials provider. A wrong password, an unknown
 * address and a deactivated member all answer "invalid", so a stranger learns nothing
 * about who has an account. Every attempt is in the lab's audit trail (never the password).
 */
export async function verifyCredentials(
  db: Database,
  raw: unknown,
  clientKey = "unknown",
  now = new Date(),
): Promise<CredentialsResult> {
  const parsed = signInSchema.safeParse(raw);
  if (!parsed.success) return { kind: "invalid" };
  const { email, password } = parsed.data;
  const check = await checkPasswordThrottled(db, { email, password, clientKey }, now);
  const user = check.user;
  const audit = (action: string, details: Record<string, unknown> = {}) =>
    insertAuditEvent(db, {
      labId: user?.labId ?? null,
      actorId: user?.id ?? null,
      action,
      targetType: "user",
      targetId: user?.id ?? null,
      details: { email, client: clientKey, ...details },
    });
  if (check.kind === "throttled") {
    await audit("auth.sign_in_throttled", { retryAfterSeconds: check.retryAfterSeconds });
    return { kind: "throttled", retryAfterSeconds: check.retryAfterSeconds };
  }
  await audit(check.ok ? "auth.signed_in" : "auth.sign_in_failed");
  if (!check.ok || !user) return { kind: "invalid" };
  return {
    kind: "ok",
    user: {
      id: user.id,
      email: user.email,
      name: user.name,
      labId: user.labId,
      role: user.role,
      sessionVersion: user.sessionVersion,
    },
  };
}
