import { Column, CreateDateColumn, Entity, JoinColumn, ManyToOne, PrimaryColumn, UpdateDateColumn, type Relation } from 'typeorm';
import { Part } from '../part.entity';
import { ALTERNATE_KINDS, type AlternateKind } from '../part.types';

/** A directed "can replace" link; the service writes both directions so either part shows the other. */
@Entity({ name: 'part_alternates' })
export class PartAlternate {
  @PrimaryColumn({ name: 'part_id', type: 'int', unsigned: true })
  partId: number;

  @PrimaryColumn({ name: 'alternate_part_id', type: 'int', unsigned: true })
  alternatePartId: number;

  @ManyToOne(() => Part, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'part_id' })
  part: Relation<Part>;

  @ManyToOne(() => Part, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'alternate_part_id' })
  alternatePart: Relation<Part>;

  @Column({ type: 'enum', enum: ALTERNATE_KINDS }) kind: AlternateKind;
  @Column({ type: 'varchar', length: 300, nullable: true }) note: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3 })
  updatedAt: Date;
}
