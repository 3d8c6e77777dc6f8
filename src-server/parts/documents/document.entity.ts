import { Column, CreateDateColumn, Entity, JoinColumn, ManyToOne, PrimaryGeneratedColumn, UpdateDateColumn, type Relation } from 'typeorm';
import { StoredFileRecord } from '../../storage/stored-file-record';
import { User } from '../../users/user.entity';
import { Part } from '../part.entity';
import { DOCUMENT_KINDS, type DocumentKind } from '../part.types';

@Entity({ name: 'part_documents' })
export class PartDocument extends StoredFileRecord {
  @PrimaryGeneratedColumn({ unsigned: true })
  id: number;

  @Column({ name: 'part_id', type: 'int', unsigned: true })
  partId: number;

  @ManyToOne(() => Part, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'part_id' })
  part: Relation<Part>;

  @Column({ type: 'enum', enum: DOCUMENT_KINDS }) kind: DocumentKind;
  @Column({ type: 'varchar', length: 200 }) title: string;

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
