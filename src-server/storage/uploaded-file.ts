import { createHash } from 'node:crypto';
import { DomainError } from '../common/domain-error';

/** One multipart file as multer hands it over (memory storage). */
export interface UploadedFile {
  originalname: string;
  mimetype: string;
  size: number;
  buffer: Buffer;
}

/** A storable file name: the original's safe characters, never a path. */
export function safeFileName(name: string): string {
  const base = name.split(/[\\/]/).pop() ?? 'file';
  // Runs of dots collapse to one: objectKey refuses ".." anywhere, and "rev..2.pdf" must still upload.
  const cleaned = base
    .replace(/[^\w.-]+/g, '_')
    .replace(/\.{2,}/g, '.')
    .replace(/^[._-]+/, '')
    .slice(0, 80);
  return cleaned || 'file';
}

export function sha256Hex(bytes: Buffer): string {
  return createHash('sha256').update(bytes).digest('hex');
}

export function requireFile(file: UploadedFile | undefined): UploadedFile {
  if (!file || file.size === 0) {
    throw new DomainError('VALIDATION_FAILED', 'file: attach a non-empty file in the multipart field "file"', 400, {
      fields: [{ field: 'file', message: 'is required and must not be empty' }],
    });
  }
  return file;
}
