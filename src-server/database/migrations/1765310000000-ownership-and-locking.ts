import type { MigrationInterface, QueryRunner } from 'typeorm';

/** A product's creator is whoever the audit log names for its "created" entry; seeded rows have none and stay unknown (NULL). */
export const BACKFILL_PRODUCT_CREATORS = `UPDATE products p SET p.created_by_id = (
  SELECT a.user_id FROM audit_entries a
  WHERE a.entity_type = 'product' AND a.entity_id = CAST(p.id AS CHAR) AND a.action = 'created'
  ORDER BY a.id LIMIT 1)
WHERE p.created_by_id IS NULL`;

/**
 * Issue 10, data ownership: who created a product, soft delete of products, optimistic locking of band sets,
 * measurement files typed by their kind, and file names stored as UTF-8 whatever the server's default charset.
 */
export class OwnershipAndLocking1765310000000 implements MigrationInterface {
  name = 'OwnershipAndLocking1765310000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE products
      ADD COLUMN created_by_id INT UNSIGNED NULL AFTER version,
      ADD COLUMN deleted_at DATETIME(3) NULL AFTER updated_at,
      ADD COLUMN deleted_by_id INT UNSIGNED NULL AFTER deleted_at,
      ADD KEY ix_products_deleted (deleted_at),
      ADD CONSTRAINT fk_products_created_by FOREIGN KEY (created_by_id) REFERENCES users(id) ON DELETE SET NULL,
      ADD CONSTRAINT fk_products_deleted_by FOREIGN KEY (deleted_by_id) REFERENCES users(id) ON DELETE SET NULL`);
    await q.query(BACKFILL_PRODUCT_CREATORS);
    await q.query('ALTER TABLE band_sets ADD COLUMN version INT UNSIGNED NOT NULL DEFAULT 1 AFTER description');
    // Downloads are typed by the measurement's kind, never by what the uploader's browser declared.
    await q.query(`UPDATE part_measurements SET content_type = IF(kind = 's11', 'text/plain', 'text/csv')`);
    // Tables take the database's default charset, which may be latin1 on a server nobody configured.
    await q.query('ALTER TABLE part_measurements MODIFY file_name VARCHAR(200) CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci NOT NULL');
    await q.query(`ALTER TABLE part_documents
      MODIFY file_name VARCHAR(200) CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci NOT NULL,
      MODIFY title VARCHAR(200) CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci NOT NULL`);
  }

  async down(q: QueryRunner): Promise<void> {
    // The uploaders' declared content types and the columns' former charsets are not restored: neither was worth keeping.
    await q.query('ALTER TABLE band_sets DROP COLUMN version');
    // Soft-deleted products were deleted as far as the old schema knows.
    await q.query('DELETE FROM products WHERE deleted_at IS NOT NULL');
    await q.query(`ALTER TABLE products
      DROP FOREIGN KEY fk_products_created_by,
      DROP FOREIGN KEY fk_products_deleted_by`);
    await q.query(`ALTER TABLE products
      DROP KEY ix_products_deleted,
      DROP COLUMN created_by_id,
      DROP COLUMN deleted_at,
      DROP COLUMN deleted_by_id`);
  }
}
