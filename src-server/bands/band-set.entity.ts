import { Column, CreateDateColumn, Entity, JoinColumn, ManyToOne, OneToMany, PrimaryColumn, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import { Band } from './band.entity';

/** A named selection of bands (e.g. one market's LTE-M bands) that engineers pick instead of single bands. */
@Entity({ name: 'band_sets' })
export class BandSet {
  @PrimaryGeneratedColumn({ unsigned: true })
  id: number;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ type: 'text' })
  description: string;

  @Column({ type: 'int', unsigned: true, default: 1 })
  version: number;

  @OneToMany(() => BandSetMember, (member) => member.bandSet)
  members: BandSetMember[];

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3 })
  updatedAt: Date;
}

@Entity({ name: 'band_set_members' })
export class BandSetMember {
  @PrimaryColumn({ name: 'band_set_id', type: 'int', unsigned: true })
  bandSetId: number;

  @PrimaryColumn({ name: 'band_id', type: 'int', unsigned: true })
  bandId: number;

  @ManyToOne(() => BandSet, (set) => set.members, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'band_set_id' })
  bandSet: BandSet;

  @ManyToOne(() => Band, { onDelete: 'RESTRICT' })
  @JoinColumn({ name: 'band_id' })
  band: Band;

  @Column({ type: 'smallint', unsigned: true, default: 0 })
  position: number;
}
