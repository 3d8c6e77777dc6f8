import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Sign-in counters move out of `users` into tables every instance shares: failed sign-ins per e-mail
 * (known or not, so unknown e-mails lock the same way) and the rate limiter's counters.
 */
export class HardenAccounts1765300000000 implements MigrationInterface {
  name = 'HardenAccounts1765300000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE login_attempts (
      email_hash CHAR(64) NOT NULL PRIMARY KEY,
      failures INT UNSIGNED NOT NULL DEFAULT 0,
      locked_until DATETIME(3) NULL,
      updated_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      KEY ix_login_attempts_updated (updated_at)
    ) ENGINE=InnoDB`);
    await q.query(`CREATE TABLE rate_limit_counters (
      counter_key CHAR(64) NOT NULL PRIMARY KEY,
      hits INT UNSIGNED NOT NULL DEFAULT 0,
      window_ends_at DATETIME(3) NOT NULL,
      blocked_until DATETIME(3) NULL,
      KEY ix_rate_limit_counters_window (window_ends_at)
    ) ENGINE=InnoDB`);
    await q.query('ALTER TABLE mail_outbox ADD COLUMN carries_link_token TINYINT(1) NOT NULL DEFAULT 0');
    await q.query('ALTER TABLE users DROP COLUMN failed_logins, DROP COLUMN locked_until');
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(
      'ALTER TABLE users ADD COLUMN failed_logins INT UNSIGNED NOT NULL DEFAULT 0 AFTER token_version, ADD COLUMN locked_until DATETIME(3) NULL AFTER failed_logins',
    );
    await q.query('ALTER TABLE mail_outbox DROP COLUMN carries_link_token');
    await q.query('DROP TABLE rate_limit_counters');
    await q.query('DROP TABLE login_attempts');
  }
}
