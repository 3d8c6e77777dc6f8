import { Column, CreateDateColumn, Entity, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn, type Relation } from 'typeorm';
import { Part } from './part.entity';
import { EFFICIENCY_BASES, type EfficiencyBasis, FIGURE_STATISTICS, type FigureStatistic, GAIN_BASES, type GainBasis } from '../rf/figure-basis';

/** A datasheet-level claim over one frequency range, used when no curve covers the range. */
@Entity({ name: 'part_spec_bands' })
export class SpecBand {
  @PrimaryGeneratedColumn({ unsigned: true })
  id: number;

  @Column({ name: 'part_id', type: 'int', unsigned: true })
  partId: number;

  @ManyToOne(() => Part, (part) => part.specBands, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'part_id' })
  part: Relation<Part>;

  @Column({ name: 'from_mhz', type: 'double' }) fromMhz: number;
  @Column({ name: 'to_mhz', type: 'double' }) toMhz: number;
  @Column({ name: 'max_vswr', type: 'double', nullable: true }) maxVswr: number | null;
  @Column({ name: 'min_return_loss_db', type: 'double', nullable: true }) minReturnLossDb: number | null;
  @Column({ name: 'efficiency_pct', type: 'double', nullable: true }) efficiencyPct: number | null;
  @Column({ name: 'efficiency_basis', type: 'enum', enum: EFFICIENCY_BASES }) efficiencyBasis: EfficiencyBasis;
  @Column({ name: 'efficiency_statistic', type: 'enum', enum: FIGURE_STATISTICS }) efficiencyStatistic: FigureStatistic;
  @Column({ name: 'peak_gain_dbi', type: 'double', nullable: true }) peakGainDbi: number | null;
  @Column({ name: 'average_gain_dbi', type: 'double', nullable: true }) averageGainDbi: number | null;
  @Column({ name: 'gain_basis', type: 'enum', enum: GAIN_BASES }) gainBasis: GainBasis;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3 })
  updatedAt: Date;
}
