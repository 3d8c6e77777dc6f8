import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import type { AuthUser } from '../../common/auth.decorators';
import { DomainError, NotFoundError } from '../../common/domain-error';
import { AuditService } from '../../audit/audit.service';
import { storedFileName } from '../../storage/file-response';
import { StoredFiles, type StoredOriginal } from '../../storage/stored-files.service';
import { type UploadedFile, requireFile } from '../../storage/uploaded-file';
import { touchPart } from '../catalogue-revision';
import { PartDocument } from './document.entity';
import { DOCUMENT_MAX_BYTES, sniffDocumentType } from './document-type';
import { Part } from '../part.entity';
import { assertCanEdit } from '../part-access';
import { documentDto, PartsService } from '../catalogue/parts.service';
import type { UploadDocumentDto } from '../dto/upload.dto';
import type { DocumentDto } from '../dto/part-response.dto';

@Injectable()
export class DocumentsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly files: StoredFiles,
    private readonly parts: PartsService,
    private readonly audit: AuditService,
  ) {}

  /** Checked by content and size before anything is stored; stored with its row through StoredFiles. */
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
    const id = await this.files.store({ keyPrefix: ['parts', partId, 'documents'], file, contentType: type.contentType }, async (manager, stored) => {
      const locked = await this.parts.lockPart(manager, partId);
      if (actor) assertCanEdit(actor, locked, 'add documents to');
      const inserted = await manager.insert(PartDocument, {
        ...stored,
        partId,
        kind: input.kind,
        title: storedFileName(input.title?.trim() || file.originalname),
        uploadedById: actor?.id ?? null,
      });
      const documentId: number = inserted.identifiers[0].id;
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
  }

  file(partId: number, documentId: number): Promise<StoredOriginal> {
    return this.files.original(PartDocument, { id: documentId, partId }, 'document', documentId);
  }

  async remove(partId: number, documentId: number, actor: AuthUser): Promise<void> {
    await this.files.removeWithin(async (manager, drop) => {
      const part = await this.parts.lockPart(manager, partId);
      assertCanEdit(actor, part, 'remove documents of');
      const row = await manager.findOneBy(PartDocument, { id: documentId, partId });
      if (!row) throw new NotFoundError('document', documentId);
      await drop(PartDocument, row);
      await touchPart(manager, partId);
      await this.audit.record(manager, {
        entityType: 'part',
        entityId: partId,
        action: 'document-removed',
        userId: actor.id,
        changes: { documentId, fileName: row.fileName },
      });
    });
  }
}
