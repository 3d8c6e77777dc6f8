import { Column } from 'typeorm';

/**
 * The columns of a row that owns one original in object storage. Entities extend it (TypeORM inherits
 * the columns), so documents, measurements and whatever stores files next keep one definition.
 */
export abstract class StoredFileRecord {
  /** The uploader's name for the file, as stored (see storedFileName). */
  @Column({ name: 'file_name', type: 'varchar', length: 200 }) fileName: string;
  /** Fixed by the owner from the content or the kind, never as the uploader declared; downloads are served with it. */
  @Column({ name: 'content_type', type: 'varchar', length: 100 }) contentType: string;
  @Column({ name: 'object_key', type: 'varchar', length: 300 }) objectKey: string;
  @Column({ name: 'size_bytes', type: 'int', unsigned: true }) sizeBytes: number;
  @Column({ type: 'char', length: 64 }) sha256: string;
}

/** The stored-file columns as plain values, ready to spread into an insert. */
export type StoredFileColumns = Pick<StoredFileRecord, 'fileName' | 'contentType' | 'objectKey' | 'sizeBytes' | 'sha256'>;
