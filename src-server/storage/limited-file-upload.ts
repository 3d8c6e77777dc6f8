import { type CallHandler, type ExecutionContext, Inject, Injectable, mixin, type NestInterceptor, PayloadTooLargeException, type Type } from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import { memoryStorage } from 'multer';
import type { Observable } from 'rxjs';
import { DomainError } from '../common/domain-error';
import { APP_CONFIG, type AppConfig } from '../config/app-config';

/** A file that is not text by its bytes (a NUL in the first 8 KiB): Touchstone and CSV never contain one. */
export function looksBinary(bytes: Uint8Array): boolean {
  return bytes.subarray(0, 8192).includes(0);
}

/** The limit a route enforces: its format's own limit, lowered to UPLOAD_MAX_MB when that is smaller. */
export function uploadLimitBytes(formatMaxBytes: number, config: Pick<AppConfig, 'uploadMaxBytes'>): number {
  return Math.min(formatMaxBytes, config.uploadMaxBytes);
}

/**
 * Multer memory upload of one `file` field that stops reading at the route's limit (see uploadLimitBytes)
 * and answers 413 { code, field, limitBytes } in the route's own words instead of a bare "payload too large".
 */
export function LimitedFileUpload(formatMaxBytes: number, code: string, what: string): Type<NestInterceptor> {
  @Injectable()
  class LimitedFileUploadInterceptor implements NestInterceptor {
    private readonly maxBytes: number;
    private readonly multipart: NestInterceptor;

    constructor(@Inject(APP_CONFIG) config: AppConfig) {
      this.maxBytes = uploadLimitBytes(formatMaxBytes, config);
      // Browsers send a file name's UTF-8 bytes as they are; multer would read them as latin1 ("BÃ¤nder.s1p").
      const Multipart = FileInterceptor('file', {
        storage: memoryStorage(),
        defParamCharset: 'utf8',
        limits: { fileSize: this.maxBytes, files: 1 },
      });
      this.multipart = new Multipart();
    }

    async intercept(context: ExecutionContext, next: CallHandler): Promise<Observable<unknown>> {
      try {
        return await this.multipart.intercept(context, next);
      } catch (error) {
        if (error instanceof PayloadTooLargeException) {
          const mib = Number((this.maxBytes / 1048576).toFixed(2));
          throw new DomainError(code, `file: ${what} may be at most ${mib} MiB; nothing was stored`, 413, { field: 'file', limitBytes: this.maxBytes });
        }
        throw error;
      }
    }
  }
  return mixin(LimitedFileUploadInterceptor);
}
