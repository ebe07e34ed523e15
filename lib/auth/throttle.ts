/**
 * How sign-in attempts are slowed, pure so it can be tested without a clock or a database.
 * The aim is to slow a password guesser down without handing anyone a way to lock a real
 * member out:
 *
 * - one client guessing one address: the first 3 failures are free, then each attempt waits
 *   2, 4, 8 … seconds after the last failure, up to 5 minutes (the guesser is slowed, the
 *   member on their own computer is not);
 * - one client trying many addresses: after 30 failures in 15 minutes that client waits until
 *   the oldest of them is 15 minutes old;
 * - many clients guessing one address: after 20 failures in 15 minutes every attempt on the
 *   address waits 30 seconds after the last failure: the member is slowed by at most that.
 *
 * Failures count only since the last success of the same address (for the pair rule).
 */
export const WINDOW_MS = 15 * 60 * 1000;
const FREE_PAIR_FAILURES = 3;
const MAX_PAIR_DELAY_S = 300;
const CLIENT_FAILURES = 30;
const ADDRESS_FAILURES = 20;
const ADDRESS_DELAY_S = 30;

export interface Attempt {
  succeeded: boolean;
  at: Date;
  clientKey: string;
}

export type ThrottleDecision = { allowed: true } | { allowed: false; retryAfterSeconds: number };

/**
 * @param addressAttempts attempts on this address within the window, newest first
 * @param clientFailures failed attempts by this client on any address within the window, newest first
 */
export function throttleDecision(
  addressAttempts: Attempt[],
  clientFailures: Date[],
  clientKey: string,
  now: Date,
): ThrottleDecision {
  const windowStart = now.getTime() - WINDOW_MS;
  const recent = addressAttempts.filter((a) => a.at.getTime() > windowStart);
  const lastSuccess = recent.find((a) => a.succeeded)?.at.getTime() ?? -Infinity;
  const failures = recent.filter((a) => !a.succeeded);
  const waits: number[] = [];

  const pair = failures.filter((a) => a.clientKey === clientKey && a.at.getTime() > lastSuccess);
  if (pair.length >= FREE_PAIR_FAILURES) {
    const delay = Math.min(2 ** (pair.length - FREE_PAIR_FAILURES + 1), MAX_PAIR_DELAY_S);
    waits.push(pair[0].at.getTime() + delay * 1000 - now.getTime());
  }
  if (failures.length >= ADDRESS_FAILURES) {
    waits.push(failures[0].at.getTime() + ADDRESS_DELAY_S * 1000 - now.getTime());
  }
  const fromClient = clientFailures.filter((at) => at.getTime() > windowStart);
  if (fromClient.length >= CLIENT_FAILURES) {
    waits.push(fromClient[CLIENT_FAILURES - 1].getTime() + WINDOW_MS - now.getTime());
  }
  const wait = Math.max(0, ...waits);
  return wait > 0
    ? { allowed: false, retryAfterSeconds: Math.max(1, Math.ceil(wait / 1000)) }
    : { allowed: true };
}
