import type { MigrationInterface, QueryRunner } from 'typeorm';

export class CreatePendingUploads1765100000000 implements MigrationInterface {
  name = 'CreatePendingUploads1765100000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE pending_uploads (
      id BIGINT UNSIGNED NOT NULL AUTO_INCREMENT PRIMARY KEY,
      object_key VARCHAR(400) NOT NULL,
      owner_id CHAR(36) NOT NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      UNIQUE KEY ux_pending_uploads_key (object_key),
      KEY ix_pending_uploads_owner (owner_id)
    ) ENGINE=InnoDB`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('DROP TABLE pending_uploads');
  }
}
