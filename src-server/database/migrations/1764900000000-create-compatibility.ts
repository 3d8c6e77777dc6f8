import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Admin-made and edited rules with their version history, and part assignments per radio (issue 6). */
export class CreateCompatibility1764900000000 implements MigrationInterface {
  name = 'CreateCompatibility1764900000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE compatibility_rules (
      rule_key VARCHAR(64) NOT NULL PRIMARY KEY,
      origin ENUM('file','admin') NOT NULL,
      definition JSON NOT NULL,
      version INT UNSIGNED NOT NULL,
      enabled TINYINT(1) NOT NULL,
      updated_by_id INT UNSIGNED NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      CONSTRAINT fk_compatibility_rules_user FOREIGN KEY (updated_by_id) REFERENCES users(id) ON DELETE SET NULL
    ) ENGINE=InnoDB`);
    await q.query(`CREATE TABLE compatibility_rule_versions (
      id INT UNSIGNED NOT NULL AUTO_INCREMENT PRIMARY KEY,
      rule_key VARCHAR(64) NOT NULL,
      version INT UNSIGNED NOT NULL,
      action ENUM('file','created','edited','enabled','disabled') NOT NULL,
      definition JSON NOT NULL,
      changed_by_id INT UNSIGNED NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      UNIQUE KEY uq_rule_versions (rule_key, version),
      CONSTRAINT fk_rule_versions_rule FOREIGN KEY (rule_key) REFERENCES compatibility_rules(rule_key) ON DELETE CASCADE,
      CONSTRAINT fk_rule_versions_user FOREIGN KEY (changed_by_id) REFERENCES users(id) ON DELETE SET NULL
    ) ENGINE=InnoDB`);
    await q.query(`CREATE TABLE part_assignments (
      id INT UNSIGNED NOT NULL AUTO_INCREMENT PRIMARY KEY,
      product_id INT UNSIGNED NOT NULL,
      radio_id INT UNSIGNED NOT NULL,
      part_id INT UNSIGNED NOT NULL,
      state ENUM('shortlisted','chosen') NOT NULL,
      note VARCHAR(500) NULL,
      chosen_radio_id INT UNSIGNED AS (IF(state = 'chosen', radio_id, NULL)) STORED,
      created_by_id INT UNSIGNED NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      UNIQUE KEY uq_assignment_radio_part (radio_id, part_id),
      UNIQUE KEY uq_assignment_one_choice (chosen_radio_id),
      KEY ix_assignment_product (product_id),
      KEY ix_assignment_part (part_id),
      CONSTRAINT fk_assignment_product FOREIGN KEY (product_id) REFERENCES products(id) ON DELETE CASCADE,
      CONSTRAINT fk_assignment_radio FOREIGN KEY (radio_id) REFERENCES radios(id) ON DELETE CASCADE,
      CONSTRAINT fk_assignment_part FOREIGN KEY (part_id) REFERENCES parts(id) ON DELETE CASCADE,
      CONSTRAINT fk_assignment_user FOREIGN KEY (created_by_id) REFERENCES users(id) ON DELETE SET NULL
    ) ENGINE=InnoDB`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('DROP TABLE part_assignments');
    await q.query('DROP TABLE compatibility_rule_versions');
    await q.query('DROP TABLE compatibility_rules');
  }
}
