import { type CallHandler, type ExecutionContext, Injectable, type NestInterceptor, PayloadTooLargeException } from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import { memoryStorage } from 'multer';
import type { Observable } from 'rxjs';
import { TOUCHSTONE_MAX_BYTES, TouchstoneError } from '../rf/touchstone';

const MultipartFile = FileInterceptor('file', { storage: memoryStorage(), limits: { fileSize: TOUCHSTONE_MAX_BYTES, files: 1 } });

/** Multer's memory upload of the `file` field; an oversized file gets the Touchstone reader's own 413 code. */
@Injectable()
export class TouchstoneUploadInterceptor implements NestInterceptor {
  private readonly multipart = new MultipartFile();

  async intercept(context: ExecutionContext, next: CallHandler): Promise<Observable<unknown>> {
    try {
      return await this.multipart.intercept(context, next);
    } catch (error) {
      if (error instanceof PayloadTooLargeException) {
        throw new TouchstoneError('TOUCHSTONE_TOO_LARGE', null, `the file is larger than the limit of ${TOUCHSTONE_MAX_BYTES} bytes (${TOUCHSTONE_MAX_BYTES / 1048576} MiB)`);
      }
      throw error;
    }
  }
}
