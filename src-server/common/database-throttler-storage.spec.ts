import { countHit, type CounterState } from './database-throttler-storage';

describe(countHit.name, () => {
  const now = Date.parse('2026-01-01T12:00:00Z');
  const fresh: CounterState = { hits: 0, windowEndsAt: new Date(now), blockedUntil: null };

  it('counts hits within a window and blocks the hit after the limit', () => {
    let state = fresh;
    for (let i = 1; i <= 3; i += 1) {
      const { next, record } = countHit(state, now + i, 60_000, 3, 30_000);
      expect(record).toMatchObject({ totalHits: i, isBlocked: false });
      state = next;
    }
    const over = countHit(state, now + 10, 60_000, 3, 30_000);
    expect(over.record).toMatchObject({ totalHits: 4, isBlocked: true, timeToBlockExpire: 30 });
    // While blocked nothing more is counted.
    const still = countHit(over.next, now + 1000, 60_000, 3, 30_000);
    expect(still.next).toBe(over.next);
    expect(still.record).toMatchObject({ isBlocked: true, timeToBlockExpire: 30 });
  });

  it('starts afresh when the window has ended or the block has run out', () => {
    expect(countHit({ hits: 3, windowEndsAt: new Date(now - 1), blockedUntil: null }, now, 60_000, 3, 30_000).record).toMatchObject({
      totalHits: 1,
      isBlocked: false,
      timeToExpire: 60,
    });
    expect(countHit({ hits: 4, windowEndsAt: new Date(now + 5000), blockedUntil: new Date(now - 1) }, now, 60_000, 3, 30_000).record).toMatchObject({
      totalHits: 1,
      isBlocked: false,
    });
  });
});
