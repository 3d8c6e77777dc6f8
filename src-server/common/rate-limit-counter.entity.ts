import { Column, Entity, PrimaryColumn } from 'typeorm';

/** One rate limiter counter (a fixed window of hits), shared by every app instance. */
@Entity({ name: 'rate_limit_counters' })
export class RateLimitCounter {
  @PrimaryColumn({ name: 'counter_key', type: 'char', length: 64 })
  counterKey: string;

  @Column({ type: 'int', unsigned: true, default: 0 })
  hits: number;

  @Column({ name: 'window_ends_at', type: 'datetime', precision: 3 })
  windowEndsAt: Date;

  @Column({ name: 'blocked_until', type: 'datetime', precision: 3, nullable: true })
  blockedUntil: Date | null;
}
