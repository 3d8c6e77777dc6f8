import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

/**
 * An object written (or about to be written) to storage whose database row is not committed yet.
 * Deleted in the same transaction that commits the row; a leftover one marks an object to remove.
 */
@Entity({ name: 'pending_uploads' })
export class PendingUpload {
  @PrimaryGeneratedColumn({ type: 'bigint', unsigned: true })
  id: string;

  @Index('ux_pending_uploads_key', { unique: true })
  @Column({ name: 'object_key', type: 'varchar', length: 400 })
  objectKey: string;

  /** The app instance doing the upload; while it lives it holds a database lock named after this id. */
  @Index('ix_pending_uploads_owner')
  @Column({ name: 'owner_id', type: 'char', length: 36 })
  ownerId: string;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;
}
