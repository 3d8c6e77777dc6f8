import type { MigrationInterface, QueryRunner } from 'typeorm';

/** The antenna catalogue: parts, spec bands, measurements, documents, sourcing and the search revision counter. */
export class CreateCatalogue1764800000000 implements MigrationInterface {
  name = 'CreateCatalogue1764800000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE manufacturers (
      id INT UNSIGNED NOT NULL AUTO_INCREMENT PRIMARY KEY,
      name VARCHAR(120) NOT NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      UNIQUE KEY uq_manufacturers_name (name)
    ) ENGINE=InnoDB`);
    await q.query(`CREATE TABLE parts (
      id INT UNSIGNED NOT NULL AUTO_INCREMENT PRIMARY KEY,
      manufacturer_id INT UNSIGNED NOT NULL,
      mpn VARCHAR(80) NOT NULL,
      title VARCHAR(200) NOT NULL,
      form_factor ENUM('chip','pcb-trace','flex','stamped-metal','patch','external-whip','panel') NOT NULL,
      mounting VARCHAR(80) NULL,
      connector ENUM('solder-pad','SMA','RP-SMA','MMCX','MCX','N','micro-coax') NOT NULL,
      polarization ENUM('linear','RHCP','LHCP') NOT NULL,
      nominal_impedance_ohms DOUBLE NOT NULL DEFAULT 50,
      length_mm DOUBLE NULL,
      width_mm DOUBLE NULL,
      height_mm DOUBLE NULL,
      eval_ground_length_mm DOUBLE NULL,
      eval_ground_width_mm DOUBLE NULL,
      temp_min_c DOUBLE NULL,
      temp_max_c DOUBLE NULL,
      lifecycle ENUM('active','nrnd','eol') NOT NULL DEFAULT 'active',
      review_state ENUM('draft','in-review','approved','restricted','retired') NOT NULL DEFAULT 'draft',
      review_comment TEXT NULL,
      notes TEXT NULL,
      search_text TEXT NOT NULL,
      created_by_id INT UNSIGNED NULL,
      submitted_by_id INT UNSIGNED NULL,
      submitted_at DATETIME(3) NULL,
      reviewed_by_id INT UNSIGNED NULL,
      reviewed_at DATETIME(3) NULL,
      version INT UNSIGNED NOT NULL DEFAULT 1,
      revision BIGINT UNSIGNED NOT NULL DEFAULT 0,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      UNIQUE KEY uq_parts_manufacturer_mpn (manufacturer_id, mpn),
      KEY ix_parts_review_state (review_state, submitted_at),
      KEY ix_parts_revision (revision),
      KEY ix_parts_mpn (mpn),
      FULLTEXT KEY ft_parts_search (search_text),
      CONSTRAINT fk_parts_manufacturer FOREIGN KEY (manufacturer_id) REFERENCES manufacturers(id) ON DELETE RESTRICT,
      CONSTRAINT fk_parts_created_by FOREIGN KEY (created_by_id) REFERENCES users(id) ON DELETE SET NULL,
      CONSTRAINT fk_parts_submitted_by FOREIGN KEY (submitted_by_id) REFERENCES users(id) ON DELETE SET NULL,
      CONSTRAINT fk_parts_reviewed_by FOREIGN KEY (reviewed_by_id) REFERENCES users(id) ON DELETE SET NULL
    ) ENGINE=InnoDB`);
    await q.query(`CREATE TABLE part_spec_bands (
      id INT UNSIGNED NOT NULL AUTO_INCREMENT PRIMARY KEY,
      part_id INT UNSIGNED NOT NULL,
      from_mhz DOUBLE NOT NULL,
      to_mhz DOUBLE NOT NULL,
      max_vswr DOUBLE NULL,
      min_return_loss_db DOUBLE NULL,
      efficiency_pct DOUBLE NULL,
      peak_gain_dbi DOUBLE NULL,
      average_gain_dbi DOUBLE NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      KEY ix_spec_bands_part (part_id),
      CONSTRAINT fk_spec_bands_part FOREIGN KEY (part_id) REFERENCES parts(id) ON DELETE CASCADE
    ) ENGINE=InnoDB`);
    // Points are packed little-endian float64 arrays: the matrix and the search index read thousands of curves.
    await q.query(`CREATE TABLE part_measurements (
      id INT UNSIGNED NOT NULL AUTO_INCREMENT PRIMARY KEY,
      part_id INT UNSIGNED NOT NULL,
      kind ENUM('s11','efficiency','peak-gain','average-gain') NOT NULL,
      ground_length_mm DOUBLE NULL,
      ground_width_mm DOUBLE NULL,
      conditions VARCHAR(500) NULL,
      file_name VARCHAR(200) NOT NULL,
      content_type VARCHAR(100) NOT NULL,
      object_key VARCHAR(300) NOT NULL,
      size_bytes INT UNSIGNED NOT NULL,
      sha256 CHAR(64) NOT NULL,
      source_format VARCHAR(60) NOT NULL,
      reference_ohms DOUBLE NULL,
      point_count INT UNSIGNED NOT NULL,
      from_hz DOUBLE NOT NULL,
      to_hz DOUBLE NOT NULL,
      frequencies_hz LONGBLOB NOT NULL,
      values_a LONGBLOB NOT NULL,
      values_b LONGBLOB NULL,
      uploaded_by_id INT UNSIGNED NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      KEY ix_measurements_part_kind (part_id, kind, created_at),
      CONSTRAINT fk_measurements_part FOREIGN KEY (part_id) REFERENCES parts(id) ON DELETE CASCADE,
      CONSTRAINT fk_measurements_user FOREIGN KEY (uploaded_by_id) REFERENCES users(id) ON DELETE SET NULL
    ) ENGINE=InnoDB`);
    await q.query(`CREATE TABLE part_documents (
      id INT UNSIGNED NOT NULL AUTO_INCREMENT PRIMARY KEY,
      part_id INT UNSIGNED NOT NULL,
      kind ENUM('datasheet','drawing','other') NOT NULL,
      title VARCHAR(200) NOT NULL,
      file_name VARCHAR(200) NOT NULL,
      content_type VARCHAR(100) NOT NULL,
      object_key VARCHAR(300) NOT NULL,
      size_bytes INT UNSIGNED NOT NULL,
      sha256 CHAR(64) NOT NULL,
      uploaded_by_id INT UNSIGNED NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      KEY ix_documents_part (part_id),
      CONSTRAINT fk_documents_part FOREIGN KEY (part_id) REFERENCES parts(id) ON DELETE CASCADE,
      CONSTRAINT fk_documents_user FOREIGN KEY (uploaded_by_id) REFERENCES users(id) ON DELETE SET NULL
    ) ENGINE=InnoDB`);
    await q.query(`CREATE TABLE part_offers (
      id INT UNSIGNED NOT NULL AUTO_INCREMENT PRIMARY KEY,
      part_id INT UNSIGNED NOT NULL,
      supplier VARCHAR(120) NOT NULL,
      sku VARCHAR(80) NULL,
      currency CHAR(3) NOT NULL,
      price_breaks JSON NOT NULL,
      min_unit_price DECIMAL(14,4) NULL,
      moq INT UNSIGNED NULL,
      lead_time_days INT UNSIGNED NULL,
      last_checked_on DATE NULL,
      version INT UNSIGNED NOT NULL DEFAULT 1,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      KEY ix_offers_part (part_id),
      KEY ix_offers_price (currency, min_unit_price),
      CONSTRAINT fk_offers_part FOREIGN KEY (part_id) REFERENCES parts(id) ON DELETE CASCADE
    ) ENGINE=InnoDB`);
    await q.query(`CREATE TABLE part_alternates (
      part_id INT UNSIGNED NOT NULL,
      alternate_part_id INT UNSIGNED NOT NULL,
      kind ENUM('alternate','second-source') NOT NULL,
      note VARCHAR(300) NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      PRIMARY KEY (part_id, alternate_part_id),
      KEY ix_alternates_other (alternate_part_id),
      CONSTRAINT fk_alternates_part FOREIGN KEY (part_id) REFERENCES parts(id) ON DELETE CASCADE,
      CONSTRAINT fk_alternates_other FOREIGN KEY (alternate_part_id) REFERENCES parts(id) ON DELETE CASCADE
    ) ENGINE=InnoDB`);
    // One row; every catalogue write bumps it so each server's in-memory search index knows to refresh.
    await q.query(`CREATE TABLE catalogue_revision (
      id TINYINT UNSIGNED NOT NULL PRIMARY KEY,
      revision BIGINT UNSIGNED NOT NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3)
    ) ENGINE=InnoDB`);
    await q.query('INSERT INTO catalogue_revision (id, revision) VALUES (1, 0)');
  }

  async down(q: QueryRunner): Promise<void> {
    for (const table of [
      'catalogue_revision',
      'part_alternates',
      'part_offers',
      'part_documents',
      'part_measurements',
      'part_spec_bands',
      'parts',
      'manufacturers',
    ]) {
      await q.query(`DROP TABLE ${table}`);
    }
  }
}
