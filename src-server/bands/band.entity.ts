import { Column, CreateDateColumn, Entity, JoinColumn, ManyToOne, OneToMany, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import { DUPLEX_MODES, type DuplexMode, RANGE_ROLES, type RangeRole, TECHNOLOGIES, type Technology } from './band-domain';

/** A standard radio band (LTE B12, NR n78, GPS L1 …) as published, with its source. */
@Entity({ name: 'bands' })
export class Band {
  @PrimaryGeneratedColumn({ unsigned: true })
  id: number;

  @Column({ type: 'enum', enum: TECHNOLOGIES })
  technology: Technology;

  @Column({ type: 'varchar', length: 40 })
  designation: string;

  @Column({ type: 'varchar', length: 160 })
  name: string;

  @Column({ type: 'enum', enum: DUPLEX_MODES })
  duplex: DuplexMode;

  @Column({ name: 'centre_mhz', type: 'double', nullable: true })
  centreMhz: number | null;

  @Column({ name: 'bandwidth_mhz', type: 'double', nullable: true })
  bandwidthMhz: number | null;

  /** GNSS only: the main lobe of the open-service signal (the ranges hold the full signal band); see catalog-seed/bands.json. */
  @Column({ name: 'main_lobe_from_mhz', type: 'double', nullable: true })
  mainLobeFromMhz: number | null;

  @Column({ name: 'main_lobe_to_mhz', type: 'double', nullable: true })
  mainLobeToMhz: number | null;

  @Column({ type: 'json' })
  regions: string[];

  @Column({ name: 'source_document', type: 'varchar', length: 200 })
  sourceDocument: string;

  @Column({ name: 'source_table', type: 'varchar', length: 200 })
  sourceTable: string;

  /** Spec release, corroboration and from-memory remarks that travel with the numbers. */
  @Column({ name: 'source_note', type: 'varchar', length: 600, nullable: true })
  sourceNote: string | null;

  @OneToMany(() => BandRange, (range) => range.band, { cascade: ['insert'] })
  ranges: BandRange[];

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3 })
  updatedAt: Date;
}

@Entity({ name: 'band_ranges' })
export class BandRange {
  @PrimaryGeneratedColumn({ unsigned: true })
  id: number;

  @Column({ name: 'band_id', type: 'int', unsigned: true })
  bandId: number;

  @ManyToOne(() => Band, (band) => band.ranges, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'band_id' })
  band: Band;

  @Column({ type: 'enum', enum: RANGE_ROLES })
  role: RangeRole;

  @Column({ name: 'from_mhz', type: 'double' })
  fromMhz: number;

  @Column({ name: 'to_mhz', type: 'double' })
  toMhz: number;

  @Column({ type: 'smallint', unsigned: true, default: 0 })
  position: number;
}
