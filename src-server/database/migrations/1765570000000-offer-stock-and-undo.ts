import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Offers as buyers keep them: the stock a supplier reports, and removed offers kept for a short undo
 * (the whole row as it was, so an undo puts back exactly what was removed, under the same id).
 */
export class OfferStockAndUndo1765570000000 implements MigrationInterface {
  name = 'OfferStockAndUndo1765570000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query('ALTER TABLE part_offers ADD COLUMN stock INT UNSIGNED NULL AFTER moq');
    await q.query(`CREATE TABLE part_offer_removals (
      offer_id INT UNSIGNED NOT NULL PRIMARY KEY,
      part_id INT UNSIGNED NOT NULL,
      offer JSON NOT NULL,
      removed_by_id INT UNSIGNED NULL,
      removed_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      KEY ix_offer_removals_part (part_id),
      KEY ix_offer_removals_at (removed_at),
      CONSTRAINT fk_offer_removals_part FOREIGN KEY (part_id) REFERENCES parts(id) ON DELETE CASCADE,
      CONSTRAINT fk_offer_removals_user FOREIGN KEY (removed_by_id) REFERENCES users(id) ON DELETE SET NULL
    ) ENGINE=InnoDB`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('DROP TABLE part_offer_removals');
    await q.query('ALTER TABLE part_offers DROP COLUMN stock');
  }
}
