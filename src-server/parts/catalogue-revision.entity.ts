import { Column, CreateDateColumn, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';

/** The single-row counter every catalogue write bumps (see catalogue-index/). */
@Entity({ name: 'catalogue_revision' })
export class CatalogueRevision {
  @PrimaryColumn({ type: 'tinyint', unsigned: true })
  id: number;

  @Column({ type: 'bigint', unsigned: true, transformer: { to: (v: number) => v, from: (v: string | number) => Number(v) } })
  revision: number;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3 })
  updatedAt: Date;
}
