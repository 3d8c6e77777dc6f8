import { type CallHandler, type ExecutionContext, Injectable, mixin, type NestInterceptor, PayloadTooLargeException, type Type } from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import { memoryStorage } from 'multer';
import type { Observable } from 'rxjs';
import { DomainError } from '../common/domain-error';

/** A file that is not text by its bytes (a NUL in the first 8 KiB): Touchstone and CSV never contain one. */
export function looksBinary(bytes: Uint8Array): boolean {
  return bytes.subarray(0, 8192).includes(0);
}

/**
 * Multer memory upload of one `file` field that stops reading at maxBytes and answers
 * 413 { code, limitBytes } in the route's own words instead of a bare "payload too large".
 */
export function LimitedFileUpload(maxBytes: number, code: string, what: string): Type<NestInterceptor> {
  // Browsers send a file name's UTF-8 bytes as they are; multer would read them as latin1 ("BÃ¤nder.s1p").
  const Multipart = FileInterceptor('file', { storage: memoryStorage(), defParamCharset: 'utf8', limits: { fileSize: maxBytes, files: 1 } });

  @Injectable()
  class LimitedFileUploadInterceptor implements NestInterceptor {
    private readonly multipart = new Multipart();

    async intercept(context: ExecutionContext, next: CallHandler): Promise<Observable<unknown>> {
      try {
        return await this.multipart.intercept(context, next);
      } catch (error) {
        if (error instanceof PayloadTooLargeException) {
          throw new DomainError(code, `file: ${what} may be at most ${maxBytes / 1048576} MiB; nothing was stored`, 413, { field: 'file', limitBytes: maxBytes });
        }
        throw error;
      }
    }
  }
  return mixin(LimitedFileUploadInterceptor);
}
