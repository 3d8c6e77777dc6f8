import type { MigrationInterface, QueryRunner } from 'typeorm';

export class CreateProducts1764700100000 implements MigrationInterface {
  name = 'CreateProducts1764700100000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE products (
      id INT UNSIGNED NOT NULL AUTO_INCREMENT PRIMARY KEY,
      name VARCHAR(120) NOT NULL,
      code VARCHAR(40) NOT NULL,
      owner VARCHAR(120) NOT NULL,
      ground_plane_length_mm DOUBLE NOT NULL,
      ground_plane_width_mm DOUBLE NOT NULL,
      target_regions JSON NOT NULL,
      notes TEXT NULL,
      version INT UNSIGNED NOT NULL DEFAULT 1,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      UNIQUE KEY uq_products_code (code)
    ) ENGINE=InnoDB`);
    await q.query(`CREATE TABLE radios (
      id INT UNSIGNED NOT NULL AUTO_INCREMENT PRIMARY KEY,
      product_id INT UNSIGNED NOT NULL,
      name VARCHAR(120) NOT NULL,
      technology ENUM('lte','nr','gnss','wifi','ble','ism','uwb','other') NOT NULL,
      module VARCHAR(160) NOT NULL,
      transmit_power_dbm DOUBLE NULL,
      polarization ENUM('linear','RHCP','LHCP','any') NOT NULL,
      connector ENUM('solder-pad','sma','rp-sma','mmcx','mcx','n','micro-coax') NOT NULL,
      feed_loss_db DOUBLE NOT NULL DEFAULT 0,
      notes TEXT NULL,
      version INT UNSIGNED NOT NULL DEFAULT 1,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      KEY ix_radios_product (product_id),
      CONSTRAINT fk_radios_product FOREIGN KEY (product_id) REFERENCES products(id) ON DELETE CASCADE
    ) ENGINE=InnoDB`);
    await q.query(`CREATE TABLE radio_bands (
      radio_id INT UNSIGNED NOT NULL,
      band_id INT UNSIGNED NOT NULL,
      certified_max_gain_dbi DOUBLE NULL,
      position SMALLINT UNSIGNED NOT NULL DEFAULT 0,
      PRIMARY KEY (radio_id, band_id),
      KEY ix_radio_bands_band (band_id),
      CONSTRAINT fk_radio_bands_radio FOREIGN KEY (radio_id) REFERENCES radios(id) ON DELETE CASCADE,
      CONSTRAINT fk_radio_bands_band FOREIGN KEY (band_id) REFERENCES bands(id) ON DELETE RESTRICT
    ) ENGINE=InnoDB`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('DROP TABLE radio_bands');
    await q.query('DROP TABLE radios');
    await q.query('DROP TABLE products');
  }
}
