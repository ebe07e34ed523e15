/**
 * Sign-in throttling policy, pure so it can be tested without a clock or a database.
 * After MAX_FAILURES failed attempts within WINDOW_MS (counted since the last success),
 * the address is refused until the oldest of those failures leaves the window.
 */
export const MAX_FAILURES = 5;
export const WINDOW_MS = 15 * 60 * 1000;

export interface Attempt {
  succeeded: boolean;
  at: Date;
}

export type ThrottleDecision = { allowed: true } | { allowed: false; retryAfterSeconds: number };

export function throttleDecision(attemptsNewestFirst: Attempt[], now: Date): ThrottleDecision {
  const windowStart = now.getTime() - WINDOW_MS;
  const failures: Attempt[] = [];
  for (const attempt of attemptsNewestFirst) {
    if (attempt.at.getTime() <= windowStart || attempt.succeeded) break;
    failures.push(attempt);
  }
  if (failures.length < MAX_FAILURES) return { allowed: true };
  const oldestCounted = failures[MAX_FAILURES - 1].at.getTime();
  const retryAfterMs = oldestCounted + WINDOW_MS - now.getTime();
  return { allowed: false, retryAfterSeconds: Math.max(1, Math.ceil(retryAfterMs / 1000)) };
}
