import { and, desc, eq, gt, sql } from "drizzle-orm";
import type { Executor } from "../client";
import { signInAttempts } from "../schema";

export async function recordSignInAttempt(
  db: Executor,
  email: string,
  clientKey: string,
  succeeded: boolean,
  at: Date,
) {
  await db.insert(signInAttempts).values({ email: email.toLowerCase(), clientKey, succeeded, at });
}

/** Attempts on an address since a moment, newest first. */
export async function recentSignInAttempts(db: Executor, email: string, since: Date) {
  return db
    .select({
      succeeded: signInAttempts.succeeded,
      at: signInAttempts.at,
      clientKey: signInAttempts.clientKey,
    })
    .from(signInAttempts)
    .where(and(sql`lower(${signInAttempts.email}) = lower(${email})`, gt(signInAttempts.at, since)))
    .orderBy(desc(signInAttempts.at))
    .limit(200);
}

/** A client's failed attempts on any address since a moment, newest first. */
export async function recentClientFailures(db: Executor, clientKey: string, since: Date) {
  const rows = await db
    .select({ at: signInAttempts.at })
    .from(signInAttempts)
    .where(
      and(
        eq(signInAttempts.clientKey, clientKey),
        eq(signInAttempts.succeeded, false),
        gt(signInAttempts.at, since),
      ),
    )
    .orderBy(desc(signInAttempts.at))
    .limit(100);
  return rows.map((r) => r.at);
}

/**
 * Serialises sign-in checks of one address until the transaction ends, so parallel attempts
 * are counted one after another instead of all passing the same check at once.
 */
export async function lockAddressForSignIn(db: Executor, email: string) {
  await db.execute(
    sql`select pg_advisory_xact_lock(hashtext(${`sign-in:${email.toLowerCase()}`}))`,
  );
}
