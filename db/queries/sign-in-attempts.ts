import { and, desc, gt, sql } from "drizzle-orm";
import type { Executor } from "../client";
import { signInAttempts } from "../schema";

export async function recordSignInAttempt(db: Executor, email: string, succeeded: boolean) {
  await db.insert(signInAttempts).values({ email: email.toLowerCase(), succeeded });
}

/** Attempts for an address since a moment, newest first. */
export async function recentSignInAttempts(db: Executor, email: string, since: Date) {
  return db
    .select({ succeeded: signInAttempts.succeeded, at: signInAttempts.at })
    .from(signInAttempts)
    .where(and(sql`lower(${signInAttempts.email}) = lower(${email})`, gt(signInAttempts.at, since)))
    .orderBy(desc(signInAttempts.at))
    .limit(50);
}
