import { Inject, Injectable, Logger } from '@nestjs/common';
import { CreateBucketCommand, DeleteObjectCommand, GetObjectCommand, HeadBucketCommand, PutObjectCommand, S3Client } from '@aws-sdk/client-s3';
import { APP_CONFIG, type AppConfig } from '../config/app-config';
import { DomainError } from '../common/domain-error';

/** Object keys are built only from these safe segments so no key can escape its prefix. */
const SAFE_SEGMENT = /^[A-Z0-9][\w.-]{0,120}$/i;

export function objectKey(...segments: (string | number)[]): string {
  for (const segment of segments) {
    const text = String(segment);
    if (!SAFE_SEGMENT.test(text) || text.includes('..')) {
      throw new DomainError('STORAGE_BAD_KEY', `"${text}" cannot be part of an object key`, 400);
    }
  }
  return segments.join('/');
}

@Injectable()
export class StorageService {
  private readonly logger = new Logger(StorageService.name);
  private readonly client: S3Client;
  private readonly bucket: string;

  constructor(@Inject(APP_CONFIG) config: AppConfig) {
    this.bucket = config.s3.bucket;
    this.client = new S3Client({
      endpoint: config.s3.endpoint,
      region: config.s3.region,
      forcePathStyle: true,
      credentials: { accessKeyId: config.s3.accessKeyId, secretAccessKey: config.s3.secretAccessKey },
      maxAttempts: 2,
    });
  }

  async ensureBucket(): Promise<void> {
    try {
      await this.client.send(new HeadBucketCommand({ Bucket: this.bucket }));
    } catch {
      await this.client.send(new CreateBucketCommand({ Bucket: this.bucket }));
    }
  }

  async isUp(): Promise<boolean> {
    try {
      await this.client.send(new HeadBucketCommand({ Bucket: this.bucket }));
      return true;
    } catch {
      return false;
    }
  }

  async put(key: string, body: Buffer, contentType: string): Promise<void> {
    try {
      await this.client.send(new PutObjectCommand({ Bucket: this.bucket, Key: key, Body: body, ContentType: contentType }));
    } catch (error) {
      this.logger.error(`storing ${key} failed: ${(error as Error).message}`);
      throw new DomainError('STORAGE_UNAVAILABLE', 'File storage is unavailable; nothing was saved, try again shortly', 503);
    }
  }

  async get(key: string): Promise<Buffer> {
    try {
      const result = await this.client.send(new GetObjectCommand({ Bucket: this.bucket, Key: key }));
      return Buffer.from(await result.Body!.transformToByteArray());
    } catch (error) {
      if ((error as { name?: string }).name === 'NoSuchKey') throw new DomainError('STORAGE_OBJECT_MISSING', `Stored file ${key} is missing`, 404);
      throw new DomainError('STORAGE_UNAVAILABLE', 'File storage is unavailable; try again shortly', 503);
    }
  }

  /** Best effort: false when the store could not be reached, so a caller can keep a note and retry. */
  async delete(key: string): Promise<boolean> {
    try {
      await this.client.send(new DeleteObjectCommand({ Bucket: this.bucket, Key: key }));
      return true;
    } catch (error) {
      this.logger.warn(`deleting ${key} failed: ${(error as Error).message}`);
      return false;
    }
  }
}
