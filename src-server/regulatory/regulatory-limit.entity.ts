import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { Technology } from '../bands/band-domain';

/** Radiated (EIRP, ERP), conducted power at the radio's port, or conducted power reduced for gain above a threshold. */
export const LIMIT_KINDS = ['eirp', 'erp', 'conducted', 'conducted-gain-rule'] as const;
export type LimitKind = (typeof LIMIT_KINDS)[number];

/** What a limit governs when its author does not say: licence-exempt radios, as every limit before technologies were named. */
export const LICENCE_EXEMPT_TECHNOLOGIES: readonly Technology[] = ['wifi', 'ble', 'ism', 'other'];

/** A published power limit for one region, frequency range and service (the technologies it governs), with the document it comes from. */
@Entity({ name: 'regulatory_limits' })
export class RegulatoryLimit {
  @PrimaryGeneratedColumn({ unsigned: true })
  id: number;

  @Column({ type: 'varchar', length: 16 })
  region: string;

  /** The radio technologies the limit governs: 47 CFR 15.247 governs licence-exempt radios, not a licensed LTE uplink in the same range. */
  @Column({ type: 'json' })
  technologies: Technology[];

  @Column({ type: 'varchar', length: 160 })
  title: string;

  @Column({ name: 'from_mhz', type: 'double' })
  fromMhz: number;

  @Column({ name: 'to_mhz', type: 'double' })
  toMhz: number;

  @Column({ type: 'enum', enum: LIMIT_KINDS })
  kind: LimitKind;

  /** Unrounded (25 mW = 13.979 dBm); valueText keeps the regulator's own wording. */
  @Column({ name: 'value_dbm', type: 'double' })
  valueDbm: number;

  @Column({ name: 'value_text', type: 'varchar', length: 80 })
  valueText: string;

  /** conducted-gain-rule only: antenna gain above this reduces the allowed conducted power. */
  @Column({ name: 'gain_threshold_dbi', type: 'double', nullable: true })
  gainThresholdDbi: number | null;

  @Column({ name: 'reduction_db_per_db', type: 'double', nullable: true })
  reductionDbPerDb: number | null;

  @Column({ type: 'varchar', length: 600, nullable: true })
  conditions: string | null;

  @Column({ type: 'varchar', length: 300 })
  source: string;

  /** Corroboration or from-memory tags copied from the reference file. */
  @Column({ type: 'varchar', length: 600, nullable: true })
  note: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3 })
  updatedAt: Date;
}
