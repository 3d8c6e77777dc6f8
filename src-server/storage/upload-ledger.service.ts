import { Inject, Injectable, Logger, OnApplicationBootstrap, OnModuleDestroy } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { randomUUID } from 'node:crypto';
import { DataSource, EntityManager, QueryRunner } from 'typeorm';
import { APP_CONFIG, type AppConfig } from '../config/app-config';
import { DomainError } from '../common/domain-error';
import { PendingUpload } from './pending-upload.entity';
import { StorageService } from './storage.service';

const SWEEP_EVERY_MS = 60_000;
/** Backstop for a note whose owner cannot be judged: a buffered upload settles in seconds, never in an hour. */
const STALE_AFTER_MINUTES = 60;
const SWEEP_BATCH = 200;

const lockName = (ownerId: string) => `bw-upload-owner-${ownerId}`;

/**
 * Makes object + row writes crash-safe. Before an object is written a pending note (key, owner) is
 * committed; the transaction that writes the referencing row deletes the note. A note whose owner
 * process is gone (its MariaDB named lock is free, which happens the moment its connection drops)
 * marks an orphan: the sweeper deletes the object, then the note, at start and every minute.
 */
@Injectable()
export class UploadLedger implements OnApplicationBootstrap, OnModuleDestroy {
  private readonly logger = new Logger(UploadLedger.name);
  private ownerId = randomUUID();
  private ownerConnection: QueryRunner | undefined;
  private readonly inFlight = new Set<string>();
  private timer: NodeJS.Timeout | undefined;
  private sweeping: Promise<number> | undefined;
  private owning: Promise<string> | undefined;

  constructor(
    @Inject(APP_CONFIG) private readonly config: AppConfig,
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly storage: StorageService,
  ) {}

  onApplicationBootstrap(): void {
    void this.sweep();
    this.timer = setInterval(() => void this.sweep(), SWEEP_EVERY_MS);
    this.timer.unref();
  }

  async onModuleDestroy(): Promise<void> {
    clearInterval(this.timer);
    await this.sweeping;
    const connection = this.ownerConnection;
    this.ownerConnection = undefined;
    if (connection && !connection.isReleased) {
      // The pooled connection outlives release(), so the lock must be given back explicitly.
      await connection.query('SELECT RELEASE_LOCK(?)', [lockName(this.ownerId)]).catch(() => undefined);
      await connection.release().catch(() => undefined);
    }
  }

  /**
   * Notes the key, then writes the object. Afterwards the caller must either commit its row together
   * with settle(manager, key) or call abandon(key).
   */
  async putPending(key: string, body: Buffer, contentType: string): Promise<void> {
    const ownerId = await this.ensureOwner();
    this.inFlight.add(key);
    try {
      await this.dataSource.getRepository(PendingUpload).insert({ objectKey: key, ownerId });
    } catch (error) {
      this.inFlight.delete(key);
      throw error;
    }
    try {
      await this.storage.put(key, body, contentType);
    } catch (error) {
      await this.abandon(key);
      throw error;
    }
    // Test-only (UPLOAD_TEST_PAUSE_MS, off by default, ignored in production): a window to kill the process in.
    if (this.config.uploadTestPauseMs > 0) await new Promise((r) => setTimeout(r, this.config.uploadTestPauseMs));
  }

  /** Inside the transaction that writes the row referencing key: the object is now owned by that row. */
  async settle(manager: EntityManager, key: string): Promise<void> {
    const result = await manager.delete(PendingUpload, { objectKey: key });
    if (result.affected !== 1) {
      // Only when this instance lost its database session long enough to be judged dead and swept.
      throw new DomainError('STORAGE_UNAVAILABLE', 'The upload was interrupted; nothing was saved, try again', 503);
    }
    this.inFlight.delete(key);
  }

  /** After the row's transaction failed (or the row was deleted): remove the object, then its note. */
  async abandon(key: string): Promise<void> {
    this.inFlight.delete(key);
    await this.removeOrphan(key).catch((error: Error) => this.logger.warn(`cleaning ${key} failed, the sweeper retries: ${error.message}`));
  }

  /** In the transaction that deletes a row: its object becomes a note, removed after commit with abandon(key). */
  async release(manager: EntityManager, key: string): Promise<void> {
    this.inFlight.add(key);
    await manager.query('INSERT IGNORE INTO pending_uploads (object_key, owner_id) VALUES (?, ?)', [key, await this.ensureOwner()]);
  }

  /** Deletes the objects of every note whose owner is gone; returns how many were cleaned. Safe from many instances. */
  sweep(): Promise<number> {
    this.sweeping ??= this.sweepOnce().finally(() => (this.sweeping = undefined));
    return this.sweeping;
  }

  private async sweepOnce(): Promise<number> {
    let cleaned = 0;
    try {
      const ownerId = await this.ensureOwner();
      const notes: { object_key: string; owner_id: string; stale: number }[] = await this.dataSource.query(
        `SELECT object_key, owner_id, created_at < NOW(3) - INTERVAL ${STALE_AFTER_MINUTES} MINUTE AS stale FROM pending_uploads ORDER BY id LIMIT ${SWEEP_BATCH}`,
      );
      const ownerAlive = new Map<string, boolean>();
      for (const note of notes) {
        let orphan: boolean;
        if (note.owner_id === ownerId) orphan = !this.inFlight.has(note.object_key);
        else {
          if (!ownerAlive.has(note.owner_id)) {
            const [{ free }] = await this.dataSource.query('SELECT IS_FREE_LOCK(?) AS free', [lockName(note.owner_id)]);
            ownerAlive.set(note.owner_id, Number(free) !== 1);
          }
          orphan = !ownerAlive.get(note.owner_id) || Number(note.stale) === 1;
        }
        if (orphan && (await this.removeOrphan(note.object_key))) cleaned += 1;
      }
      if (cleaned > 0) this.logger.log(`removed ${cleaned} orphaned upload object(s)`);
    } catch (error) {
      this.logger.warn(`upload sweep failed: ${(error as Error).message}`);
    }
    return cleaned;
  }

  /** The note stays locked while its object is deleted, so a late settle() waits and then finds it gone. */
  private removeOrphan(key: string): Promise<boolean> {
    return this.dataSource.transaction(async (manager) => {
      const held = await manager.query('SELECT id FROM pending_uploads WHERE object_key = ? FOR UPDATE', [key]);
      if (held.length === 0) return false;
      if (!(await this.storage.delete(key))) return false;
      await manager.query('DELETE FROM pending_uploads WHERE object_key = ?', [key]);
      return true;
    });
  }

  private ensureOwner(): Promise<string> {
    this.owning ??= this.takeOwnership().finally(() => (this.owning = undefined));
    return this.owning;
  }

  /** Holds a named lock on a dedicated connection for the life of the process; re-taken under a new id if the session was lost. */
  private async takeOwnership(): Promise<string> {
    if (this.ownerConnection && !this.ownerConnection.isReleased) {
      const mine = await this.ownerConnection.query('SELECT IS_USED_LOCK(?) = CONNECTION_ID() AS mine', [lockName(this.ownerId)]).then(
        (rows: { mine: number | null }[]) => Number(rows[0]?.mine) === 1,
        () => false,
      );
      if (mine) return this.ownerId;
      await this.ownerConnection.release().catch(() => undefined);
      this.ownerId = randomUUID();
    }
    const connection = this.dataSource.createQueryRunner();
    await connection.connect();
    const [{ got }] = await connection.query('SELECT GET_LOCK(?, 0) AS got', [lockName(this.ownerId)]);
    if (Number(got) !== 1) {
      await connection.release();
      throw new DomainError('STORAGE_UNAVAILABLE', 'Uploads are unavailable for a moment; try again', 503);
    }
    this.ownerConnection = connection;
    return this.ownerId;
  }
}
