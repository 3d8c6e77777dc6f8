import { LOCKOUT_MS, MAX_FAILED_LOGINS, reserveAttempt, type AttemptState } from './login-lockout';

describe(reserveAttempt.name, () => {
  const now = Date.parse('2026-01-01T12:00:00Z');

  it(`allows exactly ${MAX_FAILED_LOGINS} checks in a row, the last one setting the lock`, () => {
    let state: AttemptState = { failures: 0, lockedUntil: null };
    for (let i = 1; i <= MAX_FAILED_LOGINS; i += 1) {
      const decision = reserveAttempt(state, now);
      if (!decision.allowed) throw new Error(`check ${i} refused`);
      state = decision.next;
      expect(state.failures).toBe(i);
      expect(state.lockedUntil).toEqual(i === MAX_FAILED_LOGINS ? new Date(now + LOCKOUT_MS) : null);
    }
    expect(reserveAttempt(state, now + 1000)).toEqual({ allowed: false, retryAfterMs: LOCKOUT_MS - 1000 });
  });

  it('starts a fresh run once the lock has expired', () => {
    const decision = reserveAttempt({ failures: MAX_FAILED_LOGINS, lockedUntil: new Date(now - 1) }, now);
    expect(decision).toEqual({ allowed: true, next: { failures: 1, lockedUntil: null } });
  });
});
