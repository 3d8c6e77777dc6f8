import type { ThrottlerStorage } from '@nestjs/throttler';
import { createHash } from 'node:crypto';
import type { DataSource } from 'typeorm';
import { RateLimitCounter } from './rate-limit-counter.entity';
import { transactionWithRetry } from './transaction-retry';

/** What @nestjs/throttler expects back from its storage (times in seconds). */
export interface ThrottlerStorageRecord {
  totalHits: number;
  timeToExpire: number;
  isBlocked: boolean;
  timeToBlockExpire: number;
}

export interface CounterState {
  hits: number;
  windowEndsAt: Date;
  blockedUntil: Date | null;
}

const secondsUntil = (at: Date | null, now: number) => (at ? Math.max(0, Math.ceil((at.getTime() - now) / 1000)) : 0);

/** One hit on a fixed-window counter: more than `limit` hits in `ttlMs` blocks the key for `blockMs`. */
export function countHit(
  state: CounterState,
  now: number,
  ttlMs: number,
  limit: number,
  blockMs: number,
): { next: CounterState; record: ThrottlerStorageRecord } {
  if (state.blockedUntil && state.blockedUntil.getTime() > now) {
    return {
      next: state,
      record: {
        totalHits: state.hits,
        timeToExpire: secondsUntil(state.windowEndsAt, now),
        isBlocked: true,
        timeToBlockExpire: secondsUntil(state.blockedUntil, now),
      },
    };
  }
  // A window that has ended, or a block that has run out, starts counting afresh.
  const fresh = state.windowEndsAt.getTime() <= now || state.blockedUntil !== null;
  const hits = fresh ? 1 : state.hits + 1;
  const windowEndsAt = fresh ? new Date(now + ttlMs) : state.windowEndsAt;
  const blockedUntil = hits > limit ? new Date(now + blockMs) : null;
  return {
    next: { hits, windowEndsAt, blockedUntil },
    record: {
      totalHits: hits,
      timeToExpire: secondsUntil(windowEndsAt, now),
      isBlocked: blockedUntil !== null,
      timeToBlockExpire: secondsUntil(blockedUntil, now),
    },
  };
}

const CLEANUP_EVERY_N_HITS = 200;

/** The rate limiter's counters in the database, so every app instance draws on one allowance. */
export class DatabaseThrottlerStorage implements ThrottlerStorage {
  private hitsSinceCleanup = 0;

  constructor(private readonly dataSource: DataSource) {}

  async increment(key: string, ttl: number, limit: number, blockDuration: number): Promise<ThrottlerStorageRecord> {
    const counterKey = createHash('sha256').update(key).digest('hex');
    const record = await transactionWithRetry(this.dataSource, async (manager) => {
      const now = Date.now();
      // The upsert takes the row lock at once, so parallel first hits cannot both start from zero.
      await manager.query(
        'INSERT INTO rate_limit_counters (counter_key, hits, window_ends_at) VALUES (?, 0, ?) ON DUPLICATE KEY UPDATE counter_key = counter_key',
        [counterKey, new Date(now)],
      );
      const row = await manager.findOneOrFail(RateLimitCounter, { where: { counterKey }, lock: { mode: 'pessimistic_write' } });
      const { next, record } = countHit(row, now, ttl, limit, blockDuration);
      if (next !== row) await manager.update(RateLimitCounter, { counterKey }, next);
      return record;
    });
    if ((this.hitsSinceCleanup = (this.hitsSinceCleanup + 1) % CLEANUP_EVERY_N_HITS) === 0) await this.forgetExpired();
    return record;
  }

  private async forgetExpired(): Promise<void> {
    await this.dataSource.query('DELETE FROM rate_limit_counters WHERE window_ends_at < ? AND (blocked_until IS NULL OR blocked_until < ?) LIMIT 1000', [
      new Date(),
      new Date(),
    ]);
  }
}
