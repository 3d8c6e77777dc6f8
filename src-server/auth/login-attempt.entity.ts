import { Column, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';

/** Consecutive failed sign-ins for one e-mail, known or not; keyed by a hash so the table lists no addresses. */
@Entity({ name: 'login_attempts' })
export class LoginAttempt {
  @PrimaryColumn({ name: 'email_hash', type: 'char', length: 64 })
  emailHash: string;

  /** Password checks started in the current run of failures, including ones still being checked. */
  @Column({ type: 'int', unsigned: true, default: 0 })
  failures: number;

  @Column({ name: 'locked_until', type: 'datetime', precision: 3, nullable: true })
  lockedUntil: Date | null;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3 })
  updatedAt: Date;
}
