import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { randomUUID } from 'node:crypto';
import { DataSource, type EntityManager, type EntityTarget, type FindOptionsWhere } from 'typeorm';
import { NotFoundError } from '../common/domain-error';
import { storedFileName } from './file-response';
import { StorageService, objectKey } from './storage.service';
import type { StoredFileColumns, StoredFileRecord } from './stored-file-record';
import { UploadLedger } from './upload-ledger.service';
import { type UploadedFile, safeFileName, sha256Hex } from './uploaded-file';

/** An original fetched for download (see downloadOf). */
export interface StoredOriginal {
  body: Buffer;
  fileName: string;
  contentType: string;
}

export interface OriginalToStore {
  /** Object key segments before the file's own name, e.g. ['parts', 7, 'documents']. */
  readonly keyPrefix: readonly (string | number)[];
  readonly file: UploadedFile;
  /** Judged by the owner from the content or the kind, never taken from the upload. */
  readonly contentType: string;
}

/** Deletes one row inside a removal transaction; its object goes after commit. */
export type DropStoredRow = <E extends StoredFileRecord & { id: number }>(entity: EntityTarget<E>, row: E) => Promise<void>;

/**
 * The one way a row and its original in object storage are written, read and removed together,
 * crash-safe through the UploadLedger: whatever fails, no row points at a missing object and no object
 * outlives its row for longer than a sweep.
 */
@Injectable()
export class StoredFiles {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly storage: StorageService,
    private readonly ledger: UploadLedger,
  ) {}

  /**
   * Writes the object under a pending note, then runs write (which inserts the row with the given columns)
   * and settles the note in one transaction. If anything fails the object is abandoned and the error rethrown.
   */
  async store<T>(original: OriginalToStore, write: (manager: EntityManager, columns: StoredFileColumns) => Promise<T>): Promise<T> {
    const { file, contentType } = original;
    const key = objectKey(...original.keyPrefix, `${randomUUID()}-${safeFileName(file.originalname)}`);
    const columns: StoredFileColumns = {
      fileName: storedFileName(file.originalname),
      contentType,
      objectKey: key,
      sizeBytes: file.size,
      sha256: sha256Hex(file.buffer),
    };
    await this.ledger.putPending(key, file.buffer, contentType);
    try {
      return await this.dataSource.transaction(async (manager) => {
        const result = await write(manager, columns);
        await this.ledger.settle(manager, key);
        return result;
      });
    } catch (error) {
      await this.ledger.abandon(key);
      throw error;
    }
  }

  /** The original of the row matching where; 404 `<WHAT>_NOT_FOUND` naming id when there is no such row. */
  async original<E extends StoredFileRecord>(entity: EntityTarget<E>, where: FindOptionsWhere<E>, what: string, id: number): Promise<StoredOriginal> {
    const row = await this.dataSource.getRepository(entity).findOneBy(where);
    if (!row) throw new NotFoundError(what, id);
    return { body: await this.storage.get(row.objectKey), fileName: row.fileName, contentType: row.contentType };
  }

  /**
   * Runs work in one transaction; each row it deletes through drop() hands its object to the ledger, and the
   * objects are removed after commit (a crash in between leaves notes the sweeper finishes). A failed
   * transaction keeps rows and objects.
   */
  async removeWithin<T>(work: (manager: EntityManager, drop: DropStoredRow) => Promise<T>): Promise<T> {
    const released: string[] = [];
    const result = await this.dataSource.transaction((manager) => {
      const drop: DropStoredRow = async (entity, row) => {
        await manager.delete(entity, row.id);
        await this.ledger.release(manager, row.objectKey);
        released.push(row.objectKey);
      };
      return work(manager, drop);
    });
    for (const key of released) await this.ledger.abandon(key);
    return result;
  }
}
