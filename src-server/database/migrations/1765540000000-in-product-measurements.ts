import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Multi-port measurements of a product's own assembly with the radio and antenna role of each port; a radio's
 * antenna roles, and one chosen part per role (existing choices become the main antenna).
 */
export class InProductMeasurements1765540000000 implements MigrationInterface {
  name = 'InProductMeasurements1765540000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE in_product_measurements (
      id INT UNSIGNED NOT NULL AUTO_INCREMENT PRIMARY KEY,
      product_id INT UNSIGNED NOT NULL,
      note VARCHAR(500) NULL,
      file_name VARCHAR(200) NOT NULL,
      content_type VARCHAR(100) NOT NULL,
      object_key VARCHAR(300) NOT NULL,
      size_bytes INT UNSIGNED NOT NULL,
      sha256 CHAR(64) NOT NULL,
      source_format VARCHAR(60) NOT NULL,
      ports SMALLINT UNSIGNED NOT NULL,
      reference_ohms TEXT NOT NULL,
      point_count INT UNSIGNED NOT NULL,
      from_hz DOUBLE NOT NULL,
      to_hz DOUBLE NOT NULL,
      frequencies_hz LONGBLOB NOT NULL,
      s_matrix LONGBLOB NOT NULL,
      uploaded_by_id INT UNSIGNED NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      KEY ix_in_product_measurements_product (product_id),
      CONSTRAINT fk_in_product_measurements_product FOREIGN KEY (product_id) REFERENCES products(id) ON DELETE CASCADE,
      CONSTRAINT fk_in_product_measurements_uploader FOREIGN KEY (uploaded_by_id) REFERENCES users(id) ON DELETE SET NULL
    ) ENGINE=InnoDB`);
    await q.query("ALTER TABLE radios ADD COLUMN antenna_roles VARCHAR(100) NOT NULL DEFAULT 'main'");
    await q.query("ALTER TABLE part_assignments ADD COLUMN role ENUM('main','diversity','mimo-2','mimo-3','mimo-4') NOT NULL DEFAULT 'main'");
    await q.query('ALTER TABLE part_assignments DROP INDEX uq_assignment_one_choice, ADD UNIQUE KEY uq_assignment_one_choice_per_role (chosen_radio_id, role)');
    await q.query(`CREATE TABLE in_product_ports (
      measurement_id INT UNSIGNED NOT NULL,
      port SMALLINT UNSIGNED NOT NULL,
      radio_id INT UNSIGNED NOT NULL,
      role ENUM('main','diversity','mimo-2','mimo-3','mimo-4') NOT NULL,
      PRIMARY KEY (measurement_id, port),
      UNIQUE KEY ux_in_product_ports_antenna (measurement_id, radio_id, role),
      KEY ix_in_product_ports_radio (radio_id),
      CONSTRAINT fk_in_product_ports_measurement FOREIGN KEY (measurement_id) REFERENCES in_product_measurements(id) ON DELETE CASCADE,
      CONSTRAINT fk_in_product_ports_radio FOREIGN KEY (radio_id) REFERENCES radios(id) ON DELETE CASCADE
    ) ENGINE=InnoDB`);
  }

  async down(q: QueryRunner): Promise<void> {
    // Only main antennas survive: the old key allowed one choice per radio.
    await q.query("UPDATE part_assignments SET state = 'shortlisted' WHERE role <> 'main' AND state = 'chosen'");
    await q.query('ALTER TABLE part_assignments DROP INDEX uq_assignment_one_choice_per_role, ADD UNIQUE KEY uq_assignment_one_choice (chosen_radio_id)');
    await q.query('ALTER TABLE part_assignments DROP COLUMN role');
    await q.query('ALTER TABLE radios DROP COLUMN antenna_roles');
    await q.query('DROP TABLE in_product_ports');
    await q.query('DROP TABLE in_product_measurements');
  }
}
