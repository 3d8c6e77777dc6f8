import { Column, CreateDateColumn, Entity, JoinColumn, ManyToOne, PrimaryColumn, PrimaryGeneratedColumn, UpdateDateColumn, type Relation } from 'typeorm';
import { Part } from '../part.entity';

export interface PriceBreak {
  quantity: number;
  /** Decimal string, never a float: money. */
  unitPrice: string;
}

/** A supplier's offer for a part; prices as decimal strings. */
@Entity({ name: 'part_offers' })
export class PartOffer {
  @PrimaryGeneratedColumn({ unsigned: true })
  id: number;

  @Column({ name: 'part_id', type: 'int', unsigned: true })
  partId: number;

  @ManyToOne(() => Part, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'part_id' })
  part: Relation<Part>;

  @Column({ type: 'varchar', length: 120 }) supplier: string;
  @Column({ type: 'varchar', length: 80, nullable: true }) sku: string | null;
  @Column({ type: 'char', length: 3 }) currency: string;
  @Column({ name: 'price_breaks', type: 'json' }) priceBreaks: PriceBreak[];
  /** The lowest unit price of the breaks, kept for the price-ceiling filter. */
  @Column({ name: 'min_unit_price', type: 'decimal', precision: 14, scale: 4, nullable: true }) minUnitPrice: string | null;
  @Column({ type: 'int', unsigned: true, nullable: true }) moq: number | null;
  /** Pieces the supplier reported in stock when last checked. */
  @Column({ type: 'int', unsigned: true, nullable: true }) stock: number | null;
  @Column({ name: 'lead_time_days', type: 'int', unsigned: true, nullable: true }) leadTimeDays: number | null;
  @Column({ name: 'last_checked_on', type: 'date', nullable: true }) lastCheckedOn: string | null;
  @Column({ type: 'int', unsigned: true, default: 1 }) version: number;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'datetime', precision: 3 })
  updatedAt: Date;
}

/** A removed offer, kept whole for a short undo (OFFER_UNDO_SECONDS); an undo puts it back under its id. */
@Entity({ name: 'part_offer_removals' })
export class PartOfferRemoval {
  @PrimaryColumn({ name: 'offer_id', type: 'int', unsigned: true })
  offerId: number;

  @Column({ name: 'part_id', type: 'int', unsigned: true }) partId: number;
  @Column({ type: 'json' }) offer: Record<string, unknown>;
  @Column({ name: 'removed_by_id', type: 'int', unsigned: true, nullable: true }) removedById: number | null;
  @Column({ name: 'removed_at', type: 'datetime', precision: 3 }) removedAt: Date;
}
