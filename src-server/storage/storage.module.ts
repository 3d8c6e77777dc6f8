import { Global, Module, OnApplicationBootstrap, Logger } from '@nestjs/common';
import { StorageService } from './storage.service';
import { StoredFiles } from './stored-files.service';
import { UploadLedger } from './upload-ledger.service';

@Global()
@Module({ providers: [StorageService, UploadLedger, StoredFiles], exports: [StorageService, UploadLedger, StoredFiles] })
export class StorageModule implements OnApplicationBootstrap {
  constructor(private readonly storage: StorageService) {}

  async onApplicationBootstrap(): Promise<void> {
    // The bucket is created at start; a missing object store is reported by /api/health, not fatal.
    await this.storage.ensureBucket().catch((error: Error) => new Logger('Storage').warn(`bucket not ready: ${error.message}`));
  }
}
