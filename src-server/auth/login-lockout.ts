/** The lockout rule for sign-ins, free of the database so it is tested on its own. */

export const MAX_FAILED_LOGINS = 5;
export const LOCKOUT_MS = 5 * 60_000;

export interface AttemptState {
  failures: number;
  lockedUntil: Date | null;
}

export type AttemptDecision = { allowed: true; next: AttemptState } | { allowed: false; retryAfterMs: number };

/**
 * Reserves one password check before it runs, so parallel guesses cannot overtake the count: the
 * MAX_FAILED_LOGINS-th reservation already sets the lock, which a correct password then lifts.
 */
export function reserveAttempt(state: AttemptState, now: number): AttemptDecision {
  if (state.lockedUntil && state.lockedUntil.getTime() > now) return { allowed: false, retryAfterMs: state.lockedUntil.getTime() - now };
  // An expired lock starts a fresh run of failures.
  const failures = (state.lockedUntil ? 0 : state.failures) + 1;
  return { allowed: true, next: { failures, lockedUntil: failures >= MAX_FAILED_LOGINS ? new Date(now + LOCKOUT_MS) : null } };
}
