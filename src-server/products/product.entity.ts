import { Column, CreateDateColumn, Entity, OneToMany, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
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

  @Column({ type: 'int', unsigned: true, default: 1 })
  version: number;

  @OneToMany('Radio', (radio: Radio) => radio.product)
  radios: Radio[];

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3 })
  updatedAt: Date;
}
