import { Column, CreateDateColumn, DeleteDateColumn, Entity, JoinColumn, ManyToOne, OneToMany, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import { User } from '../users/user.entity';
// Type-only import and a string target keep product ↔ radio free of a runtime import cycle.
import type { Radio } from './radio.entity';

/** A device under design: its ground plane, markets and radios. */
@Entity({ name: 'products' })
export class Product {
  @PrimaryGeneratedColumn({ unsigned: true })
  id: number;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ type: 'varchar', length: 40 })
  code: string;

  @Column({ type: 'varchar', length: 120 })
  owner: string;

  @Column({ name: 'ground_plane_length_mm', type: 'double' })
  groundPlaneLengthMm: number;

  @Column({ name: 'ground_plane_width_mm', type: 'double' })
  groundPlaneWidthMm: number;

  @Column({ name: 'target_regions', type: 'json' })
  targetRegions: string[];

  @Column({ type: 'text', nullable: true })
  notes: string | null;

  /** Pairs of radio ids that may transmit at the same time; null: every radio may transmit with every other. */
  @Column({ name: 'simultaneous_transmit', type: 'json', nullable: true })
  simultaneousTransmit: number[][] | null;

  @Column({ type: 'int', unsigned: true, default: 1 })
  version: number;

  /** Who created the product; null for seeded or older rows whose creator is unknown. */
  @Column({ name: 'created_by_id', type: 'int', unsigned: true, nullable: true })
  createdById: number | null;

  @ManyToOne(() => User, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'created_by_id' })
  createdBy?: User | null;

  @OneToMany('Radio', (radio: Radio) => radio.product)
  radios: Radio[];

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3 })
  updatedAt: Date;

  /** Set by a (soft) delete; TypeORM's finds leave such products out unless asked with `withDeleted`. */
  @DeleteDateColumn({ name: 'deleted_at', type: 'datetime', precision: 3, nullable: true })
  deletedAt: Date | null;

  @Column({ name: 'deleted_by_id', type: 'int', unsigned: true, nullable: true })
  deletedById: number | null;

  @ManyToOne(() => User, { onDelete: 'SET NULL' })
  @JoinColumn({ name: 'deleted_by_id' })
  deletedBy?: User | null;
}
