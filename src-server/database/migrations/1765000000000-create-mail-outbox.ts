import type { MigrationInterface, QueryRunner } from 'typeorm';

export class CreateMailOutbox1765000000000 implements MigrationInterface {
  name = 'CreateMailOutbox1765000000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE mail_outbox (
      id BIGINT UNSIGNED NOT NULL AUTO_INCREMENT PRIMARY KEY,
      to_addresses JSON NOT NULL,
      subject VARCHAR(200) NOT NULL,
      body MEDIUMTEXT NOT NULL,
      status ENUM('pending','sent','failed') NOT NULL DEFAULT 'pending',
      attempts INT UNSIGNED NOT NULL DEFAULT 0,
      next_attempt_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      claimed_until DATETIME(3) NULL,
      last_error VARCHAR(500) NULL,
      sent_at DATETIME(3) NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      KEY ix_mail_outbox_due (status, next_attempt_at)
    ) ENGINE=InnoDB`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('DROP TABLE mail_outbox');
  }
}
