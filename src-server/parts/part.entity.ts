import { Column, CreateDateColumn, Entity, JoinColumn, ManyToOne, OneToMany, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import { User } from '../users/user.entity';
import { Manufacturer } from './manufacturer.entity';
import { SpecBand } from './spec-band.entity';
import {
  CONNECTORS,
  type Connector,
  FORM_FACTORS,
  type FormFactor,
  LIFECYCLES,
  type Lifecycle,
  POLARIZATIONS,
  type PartPolarization,
  REVIEW_STATES,
  type ReviewState,
} from './part.types';

/** Doubles are read back as numbers; mysql2 returns DECIMAL/BIGINT as strings otherwise. */
const doubleColumn = (name: string) => ({ name, type: 'double' as const, nullable: true });

@Entity({ name: 'parts' })
export class Part {
  @PrimaryGeneratedColumn({ unsigned: true })
  id: number;

  @Column({ name: 'manufacturer_id', type: 'int', unsigned: true })
  manufacturerId: number;

  @ManyToOne(() => Manufacturer, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'manufacturer_id' })
  manufacturer: Manufacturer;

  @Column({ type: 'varchar', length: 80 })
  mpn: string;

  @Column({ type: 'varchar', length: 200 })
  title: string;

  @Column({ name: 'form_factor', type: 'enum', enum: FORM_FACTORS })
  formFactor: FormFactor;

  @Column({ type: 'varchar', length: 80, nullable: true })
  mounting: string | null;

  @Column({ type: 'enum', enum: CONNECTORS })
  connector: Connector;

  @Column({ type: 'enum', enum: POLARIZATIONS })
  polarization: PartPolarization;

  @Column({ name: 'nominal_impedance_ohms', type: 'double', default: 50 })
  nominalImpedanceOhms: number;

  @Column(doubleColumn('length_mm')) lengthMm: number | null;
  @Column(doubleColumn('width_mm')) widthMm: number | null;
  @Column(doubleColumn('height_mm')) heightMm: number | null;
  @Column(doubleColumn('eval_ground_length_mm')) evalGroundLengthMm: number | null;
  @Column(doubleColumn('eval_ground_width_mm')) evalGroundWidthMm: number | null;
  @Column(doubleColumn('temp_min_c')) tempMinC: number | null;
  @Column(doubleColumn('temp_max_c')) tempMaxC: number | null;

  @Column({ type: 'enum', enum: LIFECYCLES, default: 'active' })
  lifecycle: Lifecycle;

  @Column({ name: 'review_state', type: 'enum', enum: REVIEW_STATES, default: 'draft' })
  reviewState: ReviewState;

  @Column({ name: 'review_comment', type: 'text', nullable: true })
  reviewComment: string | null;

  @Column({ type: 'text', nullable: true })
  notes: string | null;

  /** Manufacturer, MPN, title and notes in one FULLTEXT-indexed column. */
  @Column({ name: 'search_text', type: 'text', select: false })
  searchText: string;

  @Column({ name: 'created_by_id', type: 'int', unsigned: true, nullable: true })
  createdById: number | null;

  @ManyToOne(() => User, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'created_by_id' })
  createdBy: User | null;

  @Column({ name: 'submitted_by_id', type: 'int', unsigned: true, nullable: true })
  submittedById: number | null;

  @ManyToOne(() => User, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'submitted_by_id' })
  submittedBy: User | null;

  @Column({ name: 'submitted_at', type: 'datetime', precision: 3, nullable: true })
  submittedAt: Date | null;

  @Column({ name: 'reviewed_by_id', type: 'int', unsigned: true, nullable: true })
  reviewedById: number | null;

  @ManyToOne(() => User, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'reviewed_by_id' })
  reviewedBy: User | null;

  @Column({ name: 'reviewed_at', type: 'datetime', precision: 3, nullable: true })
  reviewedAt: Date | null;

  @Column({ type: 'int', unsigned: true, default: 1 })
  version: number;

  /** The catalogue revision of this part's last change; the search index reloads parts above its revision. */
  @Column({ type: 'bigint', unsigned: true, default: 0, transformer: { to: (v: number) => v, from: (v: string | number) => Number(v) } })
  revision: number;

  @OneToMany(() => SpecBand, (band) => band.part)
  specBands: SpecBand[];

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3 })
  updatedAt: Date;
}
