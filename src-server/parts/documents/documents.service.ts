import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import { randomUUID } from 'node:crypto';
import type { AuthUser } from '../../common/auth.decorators';
import { DomainError, NotFoundError } from '../../common/domain-error';
import { AuditService } from '../../audit/audit.service';
import { StorageService, objectKey } from '../../storage/storage.service';
import { UploadLedger } from '../../storage/upload-ledger.service';
import { touchPart } from '../catalogue-revision';
import { storedFileName } from '../file-response';
import { PartDocument } from './document.entity';
import { DOCUMENT_MAX_BYTES, sniffDocumentType } from './document-type';
import { type UploadedFile, requireFile, safeFileName, sha256Hex } from '../measurements/measurements.service';
import { Part } from '../part.entity';
import { assertCanEdit } from '../part-access';
import { documentDto, PartsService } from '../catalogue/parts.service';
import type { UploadDocumentDto } from '../dto/upload.dto';
import type { DocumentDto } from '../dto/part-response.dto';

@Injectable()
export class DocumentsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly storage: StorageService,
    private readonly ledger: UploadLedger,
    private readonly parts: PartsService,
    private readonly audit: AuditService,
  ) {}

  /** Checked by content and size before anything is stored; pending note, object, then row + note removal in one transaction (see UploadLedger). */
  async upload(partId: number, maybeFile: UploadedFile | undefined, input: UploadDocumentDto, actor: AuthUser | null): Promise<DocumentDto> {
    const part = await this.dataSource.getRepository(Part).findOneBy({ id: partId });
    if (!part) throw new NotFoundError('part', partId);
    if (actor) assertCanEdit(actor, part, 'add documents to');
    const file = requireFile(maybeFile);
    if (file.size > DOCUMENT_MAX_BYTES) {
      throw new DomainError('DOCUMENT_TOO_LARGE', `The file is ${file.size} bytes; documents may be at most ${DOCUMENT_MAX_BYTES / 1048576} MiB`, 413);
    }
    const type = sniffDocumentType(file.buffer);
    if (!type)
      throw new DomainError('DOCUMENT_TYPE_NOT_ALLOWED', `${file.originalname} is not a PDF, PNG, SVG or DXF file (judged by its content, not its name)`, 415);
    const key = objectKey('parts', partId, 'documents', `${randomUUID()}-${safeFileName(file.originalname)}`);
    await this.ledger.putPending(key, file.buffer, type.contentType);
    try {
      const id = await this.dataSource.transaction(async (manager) => {
        const locked = await this.parts.lockPart(manager, partId);
        if (actor) assertCanEdit(actor, locked, 'add documents to');
        const inserted = await manager.insert(PartDocument, {
          partId,
          kind: input.kind,
          title: storedFileName(input.title?.trim() || file.originalname),
          fileName: storedFileName(file.originalname),
          contentType: type.contentType,
          objectKey: key,
          sizeBytes: file.size,
          sha256: sha256Hex(file.buffer),
          uploadedById: actor?.id ?? null,
        });
        const documentId: number = inserted.identifiers[0].id;
        await this.ledger.settle(manager, key);
        await touchPart(manager, partId);
        await this.audit.record(manager, {
          entityType: 'part',
          entityId: partId,
          action: 'document-added',
          userId: actor?.id ?? null,
          changes: { documentId, kind: input.kind, fileName: file.originalname, type: type.label, sizeBytes: file.size },
        });
        return documentId;
      });
      return documentDto(await this.dataSource.getRepository(PartDocument).findOneOrFail({ where: { id }, relations: { uploadedBy: true } }));
    } catch (error) {
      await this.ledger.abandon(key);
      throw error;
    }
  }

  async file(partId: number, documentId: number): Promise<{ body: Buffer; fileName: string; contentType: string }> {
    const row = await this.dataSource.getRepository(PartDocument).findOneBy({ id: documentId, partId });
    if (!row) throw new NotFoundError('document', documentId);
    return { body: await this.storage.get(row.objectKey), fileName: row.fileName, contentType: row.contentType };
  }

  async remove(partId: number, documentId: number, actor: AuthUser): Promise<void> {
    const key = await this.dataSource.transaction(async (manager) => {
      const part = await this.parts.lockPart(manager, partId);
      assertCanEdit(actor, part, 'remove documents of');
      const row = await manager.findOneBy(PartDocument, { id: documentId, partId });
      if (!row) throw new NotFoundError('document', documentId);
      await manager.delete(PartDocument, { id: documentId });
      await this.ledger.release(manager, row.objectKey);
      await touchPart(manager, partId);
      await this.audit.record(manager, {
        entityType: 'part',
        entityId: partId,
        action: 'document-removed',
        userId: actor.id,
        changes: { documentId, fileName: row.fileName },
      });
      return row.objectKey;
    });
    await this.ledger.abandon(key);
  }
}
