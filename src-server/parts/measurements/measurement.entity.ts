import { Column, CreateDateColumn, Entity, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn, type Relation } from 'typeorm';
import { StoredFileRecord } from '../../storage/stored-file-record';
import { User } from '../../users/user.entity';
import { Part } from '../part.entity';
import { MEASUREMENT_BASES, MEASUREMENT_KINDS, type MeasurementBasis, type MeasurementKind } from '../part.types';

/**
 * One measured curve. Points are packed float64 arrays (see point-codec.ts): for s11 values_a/values_b
 * hold Re/Im of Γ against reference_ohms; for the others values_a holds % (efficiency) or dBi (gain).
 */
@Entity({ name: 'part_measurements' })
export class Measurement extends StoredFileRecord {
  @PrimaryGeneratedColumn({ unsigned: true })
  id: number;

  @Column({ name: 'part_id', type: 'int', unsigned: true })
  partId: number;

  @ManyToOne(() => Part, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'part_id' })
  part: Relation<Part>;

  @Column({ type: 'enum', enum: MEASUREMENT_KINDS })
  kind: MeasurementKind;

  /** What the curve includes: radiation or total (efficiency), peak or realized (gains); null for s11. */
  @Column({ type: 'enum', enum: MEASUREMENT_BASES, nullable: true })
  basis: MeasurementBasis | null;

  @Column({ name: 'ground_length_mm', type: 'double', nullable: true }) groundLengthMm: number | null;
  @Column({ name: 'ground_width_mm', type: 'double', nullable: true }) groundWidthMm: number | null;
  @Column({ type: 'varchar', length: 500, nullable: true }) conditions: string | null;
  /** e.g. "Touchstone 1.0 S RI" or "CSV %". */
  @Column({ name: 'source_format', type: 'varchar', length: 60 }) sourceFormat: string;
  @Column({ name: 'reference_ohms', type: 'double', nullable: true }) referenceOhms: number | null;
  @Column({ name: 'point_count', type: 'int', unsigned: true }) pointCount: number;
  @Column({ name: 'from_hz', type: 'double' }) fromHz: number;
  @Column({ name: 'to_hz', type: 'double' }) toHz: number;
  @Column({ name: 'frequencies_hz', type: 'longblob', select: false }) frequenciesHz: Buffer;
  @Column({ name: 'values_a', type: 'longblob', select: false }) valuesA: Buffer;
  @Column({ name: 'values_b', type: 'longblob', nullable: true, select: false }) valuesB: Buffer | null;

  @Column({ name: 'uploaded_by_id', type: 'int', unsigned: true, nullable: true })
  uploadedById: number | null;

  @ManyToOne(() => User, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'uploaded_by_id' })
  uploadedBy: User | null;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3 })
  updatedAt: Date;
}
