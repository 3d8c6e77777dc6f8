import type { MigrationInterface, QueryRunner } from 'typeorm';

export class CreateUsersAndAudit1764620000000 implements MigrationInterface {
  name = 'CreateUsersAndAudit1764620000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE users (
      id INT UNSIGNED NOT NULL AUTO_INCREMENT PRIMARY KEY,
      email VARCHAR(254) NOT NULL,
      name VARCHAR(120) NOT NULL,
      role ENUM('procurement','engineer','admin') NOT NULL,
      status ENUM('invited','active','deactivated') NOT NULL DEFAULT 'invited',
      password_hash VARCHAR(100) NULL,
      token_version INT UNSIGNED NOT NULL DEFAULT 0,
      failed_logins INT UNSIGNED NOT NULL DEFAULT 0,
      locked_until DATETIME(3) NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      UNIQUE KEY uq_users_email (email)
    ) ENGINE=InnoDB`);
    await q.query(`CREATE TABLE user_tokens (
      id INT UNSIGNED NOT NULL AUTO_INCREMENT PRIMARY KEY,
      user_id INT UNSIGNED NOT NULL,
      purpose ENUM('invitation','password-reset') NOT NULL,
      token_hash CHAR(64) NOT NULL,
      expires_at DATETIME(3) NOT NULL,
      used_at DATETIME(3) NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      UNIQUE KEY uq_user_tokens_hash (token_hash),
      KEY ix_user_tokens_user (user_id),
      CONSTRAINT fk_user_tokens_user FOREIGN KEY (user_id) REFERENCES users(id) ON DELETE CASCADE
    ) ENGINE=InnoDB`);
    await q.query(`CREATE TABLE audit_entries (
      id BIGINT UNSIGNED NOT NULL AUTO_INCREMENT PRIMARY KEY,
      entity_type VARCHAR(40) NOT NULL,
      entity_id VARCHAR(40) NOT NULL,
      action VARCHAR(40) NOT NULL,
      user_id INT UNSIGNED NULL,
      changes JSON NOT NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      KEY ix_audit_entity (entity_type, entity_id, created_at),
      KEY ix_audit_created (created_at),
      CONSTRAINT fk_audit_user FOREIGN KEY (user_id) REFERENCES users(id) ON DELETE SET NULL
    ) ENGINE=InnoDB`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('DROP TABLE audit_entries');
    await q.query('DROP TABLE user_tokens');
    await q.query('DROP TABLE users');
  }
}
