import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { createHash } from 'node:crypto';
import { DataSource, LessThan } from 'typeorm';
import { transactionWithRetry } from '../common/transaction-retry';
import { LoginAttempt } from './login-attempt.entity';
import { reserveAttempt } from './login-lockout';

/** Rows untouched this long are forgotten, so guessed e-mails do not pile up. */
const FORGET_AFTER_MS = 24 * 3600_000;
const CLEANUP_EVERY_N_RESERVATIONS = 100;

export const emailKey = (email: string): string => createHash('sha256').update(email.trim().toLowerCase()).digest('hex');

/** Failed sign-ins per e-mail in the database, so every instance and every parallel request sees one count. */
@Injectable()
export class LoginAttemptsService {
  private reservations = 0;

  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  /** Counts a password check before it runs; refused (with the wait) while the e-mail is locked. */
  async reserve(email: string): Promise<{ allowed: true } | { allowed: false; retryAfterMs: number }> {
    const emailHash = emailKey(email);
    const decision = await transactionWithRetry(this.dataSource, async (manager) => {
      // The upsert takes the row lock at once, so two first attempts cannot both read "no row".
      await manager.query('INSERT INTO login_attempts (email_hash) VALUES (?) ON DUPLICATE KEY UPDATE email_hash = email_hash', [emailHash]);
      const row = await manager.findOneOrFail(LoginAttempt, { where: { emailHash }, lock: { mode: 'pessimistic_write' } });
      const next = reserveAttempt(row, Date.now());
      if (next.allowed) await manager.update(LoginAttempt, { emailHash }, next.next);
      return next;
    });
    if ((this.reservations = (this.reservations + 1) % CLEANUP_EVERY_N_RESERVATIONS) === 0) await this.forgetStale();
    return decision.allowed ? { allowed: true } : decision;
  }

  /** A correct password or a password reset ends the run of failures and any lock. */
  async clear(email: string): Promise<void> {
    await this.dataSource.getRepository(LoginAttempt).delete({ emailHash: emailKey(email) });
  }

  private async forgetStale(): Promise<void> {
    // A lock lasts minutes, so a row untouched for a day holds no live lock.
    await this.dataSource.getRepository(LoginAttempt).delete({ updatedAt: LessThan(new Date(Date.now() - FORGET_AFTER_MS)) });
  }
}
