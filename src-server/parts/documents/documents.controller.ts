import {
  Body,
  Controller,
  Delete,
  Get,
  Header,
  HttpCode,
  Param,
  Post,
  StreamableFile,
  UploadedFile as UploadedFileParam,
  UseInterceptors,
} from '@nestjs/common';
import { ApiBody, ApiConsumes, ApiCreatedResponse, ApiOperation, ApiTags } from '@nestjs/swagger';
import { type AuthUser, CurrentUser, Roles } from '../../common/auth.decorators';
import { ALL_ROLES } from '../../common/roles';
import { ParseIdPipe } from '../../common/parse-id.pipe';
import { DocumentsService } from './documents.service';
import { LimitedFileUpload } from '../../storage/limited-file-upload';
import { DOCUMENT_MAX_BYTES } from './document-type';
import { downloadOf } from '../../storage/file-response';
import type { UploadedFile } from '../../storage/uploaded-file';
import { UploadDocumentDto } from '../dto/upload.dto';
import { DocumentDto } from '../dto/part-response.dto';

@ApiTags('part documents')
@Controller('parts/:id/documents')
export class DocumentsController {
  constructor(private readonly documents: DocumentsService) {}

  @Post()
  @Roles('engineer', 'admin')
  @UseInterceptors(LimitedFileUpload(DOCUMENT_MAX_BYTES, 'DOCUMENT_TOO_LARGE', 'a document'))
  @ApiConsumes('multipart/form-data')
  @ApiBody({
    schema: {
      type: 'object',
      required: ['file', 'kind'],
      properties: { file: { type: 'string', format: 'binary' }, kind: { type: 'string', enum: ['datasheet', 'drawing', 'other'] }, title: { type: 'string' } },
    },
  })
  @ApiOperation({ summary: 'Attach a datasheet or drawing (PDF, PNG, SVG, DXF by content; at most 20 MiB); stored with SHA-256' })
  @ApiCreatedResponse({ type: DocumentDto })
  upload(
    @Param('id', ParseIdPipe) id: number,
    @UploadedFileParam() file: UploadedFile | undefined,
    @Body() body: UploadDocumentDto,
    @CurrentUser() user: AuthUser,
  ): Promise<DocumentDto> {
    return this.documents.upload(id, file, body, user);
  }

  @Get(':documentId/file')
  @Roles(...ALL_ROLES)
  @ApiOperation({ summary: 'Download a document, typed by its content as judged at upload' })
  @Header('X-Content-Type-Options', 'nosniff')
  async file(@Param('id', ParseIdPipe) id: number, @Param('documentId', ParseIdPipe) documentId: number): Promise<StreamableFile> {
    return downloadOf(await this.documents.file(id, documentId));
  }

  @Delete(':documentId')
  @Roles('engineer', 'admin')
  @HttpCode(204)
  @ApiOperation({ summary: 'Remove a document (engineer: own drafts)' })
  remove(@Param('id', ParseIdPipe) id: number, @Param('documentId', ParseIdPipe) documentId: number, @CurrentUser() user: AuthUser): Promise<void> {
    return this.documents.remove(id, documentId, user);
  }
}
