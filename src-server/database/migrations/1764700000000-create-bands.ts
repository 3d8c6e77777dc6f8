import type { MigrationInterface, QueryRunner } from 'typeorm';

export class CreateBands1764700000000 implements MigrationInterface {
  name = 'CreateBands1764700000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE bands (
      id INT UNSIGNED NOT NULL AUTO_INCREMENT PRIMARY KEY,
      technology ENUM('lte','nr','gnss','wifi','ble','ism','uwb','other') NOT NULL,
      designation VARCHAR(40) NOT NULL,
      name VARCHAR(160) NOT NULL,
      duplex ENUM('FDD','TDD','receive-only','half-duplex') NOT NULL,
      centre_mhz DOUBLE NULL,
      bandwidth_mhz DOUBLE NULL,
      regions JSON NOT NULL,
      source_document VARCHAR(200) NOT NULL,
      source_table VARCHAR(200) NOT NULL,
      source_note VARCHAR(600) NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      UNIQUE KEY uq_bands_designation (designation),
      KEY ix_bands_technology (technology)
    ) ENGINE=InnoDB`);
    await q.query(`CREATE TABLE band_ranges (
      id INT UNSIGNED NOT NULL AUTO_INCREMENT PRIMARY KEY,
      band_id INT UNSIGNED NOT NULL,
      role ENUM('uplink','downlink','tdd','receive','transmit-receive') NOT NULL,
      from_mhz DOUBLE NOT NULL,
      to_mhz DOUBLE NOT NULL,
      position SMALLINT UNSIGNED NOT NULL DEFAULT 0,
      KEY ix_band_ranges_band (band_id),
      KEY ix_band_ranges_freq (from_mhz, to_mhz),
      CONSTRAINT fk_band_ranges_band FOREIGN KEY (band_id) REFERENCES bands(id) ON DELETE CASCADE,
      CONSTRAINT ck_band_ranges_order CHECK (to_mhz > from_mhz)
    ) ENGINE=InnoDB`);
    await q.query(`CREATE TABLE band_sets (
      id INT UNSIGNED NOT NULL AUTO_INCREMENT PRIMARY KEY,
      name VARCHAR(120) NOT NULL,
      description TEXT NOT NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      UNIQUE KEY uq_band_sets_name (name)
    ) ENGINE=InnoDB`);
    await q.query(`CREATE TABLE band_set_members (
      band_set_id INT UNSIGNED NOT NULL,
      band_id INT UNSIGNED NOT NULL,
      position SMALLINT UNSIGNED NOT NULL DEFAULT 0,
      PRIMARY KEY (band_set_id, band_id),
      KEY ix_band_set_members_band (band_id),
      CONSTRAINT fk_band_set_members_set FOREIGN KEY (band_set_id) REFERENCES band_sets(id) ON DELETE CASCADE,
      CONSTRAINT fk_band_set_members_band FOREIGN KEY (band_id) REFERENCES bands(id) ON DELETE RESTRICT
    ) ENGINE=InnoDB`);
    await q.query(`CREATE TABLE regulatory_limits (
      id INT UNSIGNED NOT NULL AUTO_INCREMENT PRIMARY KEY,
      region VARCHAR(16) NOT NULL,
      title VARCHAR(160) NOT NULL,
      from_mhz DOUBLE NOT NULL,
      to_mhz DOUBLE NOT NULL,
      kind ENUM('eirp','erp','conducted-gain-rule') NOT NULL,
      value_dbm DOUBLE NOT NULL,
      value_text VARCHAR(80) NOT NULL,
      gain_threshold_dbi DOUBLE NULL,
      reduction_db_per_db DOUBLE NULL,
      conditions VARCHAR(600) NULL,
      source VARCHAR(300) NOT NULL,
      note VARCHAR(600) NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      KEY ix_regulatory_limits_lookup (region, from_mhz, to_mhz),
      CONSTRAINT ck_regulatory_limits_order CHECK (to_mhz > from_mhz)
    ) ENGINE=InnoDB`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('DROP TABLE regulatory_limits');
    await q.query('DROP TABLE band_set_members');
    await q.query('DROP TABLE band_sets');
    await q.query('DROP TABLE band_ranges');
    await q.query('DROP TABLE bands');
  }
}
