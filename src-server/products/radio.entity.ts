import { Column, CreateDateColumn, Entity, JoinColumn, ManyToOne, OneToMany, PrimaryColumn, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import { GNSS_BANDWIDTHS, type GnssBandwidth, TECHNOLOGIES, type Technology } from '../bands/band-domain';
import { Band } from '../bands/band.entity';
import { CONNECTORS, type Connector } from '../common/connectors';
import { Product } from './product.entity';
import type { AntennaRole } from './in-product/antenna-roles';

export const POLARIZATIONS = ['linear', 'RHCP', 'LHCP', 'any'] as const;
export type Polarization = (typeof POLARIZATIONS)[number];

export { CONNECTORS, type Connector } from '../common/connectors';

/** One radio of a product (a cellular modem, a GNSS receiver …) and the bands it must cover. */
@Entity({ name: 'radios' })
export class Radio {
  @PrimaryGeneratedColumn({ unsigned: true })
  id: number;

  @Column({ name: 'product_id', type: 'int', unsigned: true })
  productId: number;

  @ManyToOne(() => Product, (product) => product.radios, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'product_id' })
  product: Product;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ type: 'enum', enum: TECHNOLOGIES })
  technology: Technology;

  @Column({ type: 'varchar', length: 160 })
  module: string;

  /** Null for receive-only radios (GNSS). */
  @Column({ name: 'transmit_power_dbm', type: 'double', nullable: true })
  transmitPowerDbm: number | null;

  @Column({ type: 'enum', enum: POLARIZATIONS })
  polarization: Polarization;

  @Column({ type: 'enum', enum: CONNECTORS })
  connector: Connector;

  @Column({ name: 'feed_loss_db', type: 'double', default: 0 })
  feedLossDb: number;

  /** GNSS only: judged on the main lobe of each signal (default) or on the full signal band; null for other radios. */
  @Column({ name: 'gnss_bandwidth', type: 'enum', enum: GNSS_BANDWIDTHS, nullable: true })
  gnssBandwidth: GnssBandwidth | null;
  /** The antennas the radio needs, main first (e.g. main, diversity); one part is chosen per role. */
  @Column({ name: 'antenna_roles', type: 'simple-array', default: 'main' })
  antennaRoles: AntennaRole[];

  @Column({ type: 'text', nullable: true })
  notes: string | null;

  @Column({ type: 'int', unsigned: true, default: 1 })
  version: number;

  @OneToMany(() => RadioBand, (rb) => rb.radio)
  bands: RadioBand[];

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3 })
  updatedAt: Date;
}

/** A band a radio uses, with the module's certified maximum antenna gain there. */
@Entity({ name: 'radio_bands' })
export class RadioBand {
  @PrimaryColumn({ name: 'radio_id', type: 'int', unsigned: true })
  radioId: number;

  @PrimaryColumn({ name: 'band_id', type: 'int', unsigned: true })
  bandId: number;

  @ManyToOne(() => Radio, (radio) => radio.bands, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'radio_id' })
  radio: Radio;

  @ManyToOne(() => Band, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'band_id' })
  band: Band;

  @Column({ name: 'certified_max_gain_dbi', type: 'double', nullable: true })
  certifiedMaxGainDbi: number | null;

  /** The channels the radio uses in this band (MHz ranges inside its transmit ranges); null: the whole band. */
  @Column({ type: 'json', nullable: true })
  channels: RadioChannel[] | null;

  @Column({ type: 'smallint', unsigned: true, default: 0 })
  position: number;
}

export interface RadioChannel {
  fromMhz: number;
  toMhz: number;
}
