import { Body, Controller, Get, HttpCode, Param, Patch, Post, Query, Res, UploadedFile as UploadedFileParam, UseInterceptors } from '@nestjs/common';
import type { Response } from 'express';
import { ApiBody, ApiConsumes, ApiCreatedResponse, ApiOkResponse, ApiOperation, ApiProduces, ApiTags } from '@nestjs/swagger';
import { type AuthUser, CurrentUser, Roles } from '../../common/auth.decorators';
import { ALL_ROLES } from '../../common/roles';
import { ParseIdPipe } from '../../common/parse-id.pipe';
import { CatalogueSearchService, parseCovers } from './catalogue-index/catalogue-search.service';
import { LimitedFileUpload } from '../../storage/limited-file-upload';
import type { UploadedFile } from '../../storage/uploaded-file';
import { PART_IMPORT_MAX_BYTES, PartCsvService } from '../import-export/part-csv.service';
import { PartsService } from './parts.service';
import { CreatePartDto, UpdatePartDto } from '../dto/part-input.dto';
import { PartDetailDto, PartListDto } from '../dto/part-response.dto';
import { PartSearchDto } from '../dto/part-search.dto';
import { HistoryQueryDto, PartDetailQueryDto } from '../dto/part-detail-query.dto';
import { ImportQueryDto, ImportResultDto } from '../dto/import.dto';
import { AuditPageDto } from '../../audit/dto/audit-page.dto';

@ApiTags('parts')
@Controller('parts')
export class PartsController {
  constructor(
    private readonly parts: PartsService,
    private readonly search: CatalogueSearchService,
    private readonly csv: PartCsvService,
  ) {}

  @Get()
  @Roles(...ALL_ROLES)
  @ApiOperation({ summary: 'Search the catalogue: text, filters, band coverage, paging and sorting (procurement sees approved parts unless it asks)' })
  @ApiOkResponse({ type: PartListDto })
  list(@Query() query: PartSearchDto, @CurrentUser() user: AuthUser): Promise<PartListDto> {
    return this.search.search(query, user);
  }

  @Get('export')
  @Roles(...ALL_ROLES)
  @ApiProduces('text/csv')
  @ApiOperation({ summary: 'The current search as CSV, every match, same filters and order' })
  async export(@Query() query: PartSearchDto, @CurrentUser() user: AuthUser, @Res({ passthrough: true }) response: Response): Promise<string> {
    const text = await this.csv.exportCsv(query, user);
    // Set only once the file exists: a refused query must still answer as JSON.
    response.setHeader('Content-Type', 'text/csv; charset=utf-8');
    response.setHeader('Content-Disposition', 'attachment; filename="bandwright-catalogue.csv"');
    return text;
  }

  @Post()
  @Roles('engineer', 'admin')
  @ApiOperation({ summary: 'Create a draft part (engineer, admin)' })
  @ApiCreatedResponse({ type: PartDetailDto })
  create(@Body() body: CreatePartDto, @CurrentUser() user: AuthUser): Promise<PartDetailDto> {
    return this.parts.create(body, user);
  }

  @Post('imports')
  @Roles('engineer', 'admin')
  @HttpCode(200)
  @UseInterceptors(LimitedFileUpload(PART_IMPORT_MAX_BYTES, 'PART_IMPORT_TOO_LARGE', 'an import'))
  @ApiConsumes('multipart/form-data')
  @ApiBody({ schema: { type: 'object', properties: { file: { type: 'string', format: 'binary' } } } })
  @ApiOperation({
    summary:
      'Import draft parts from CSV (at most 4 MiB and 5,000 rows; each row checked like POST /api/parts); dryRun (default true) lists every problem by row and column and writes nothing',
  })
  @ApiOkResponse({ type: ImportResultDto })
  import(@UploadedFileParam() file: UploadedFile | undefined, @Query() query: ImportQueryDto, @CurrentUser() user: AuthUser): Promise<ImportResultDto> {
    return this.csv.importCsv(file, query.dryRun ?? true, user);
  }

  @Get(':id')
  @Roles(...ALL_ROLES)
  @ApiOperation({ summary: 'A part with spec bands, measurements, per-range figures, documents and sourcing' })
  @ApiOkResponse({ type: PartDetailDto })
  get(@Param('id', ParseIdPipe) id: number, @Query() query: PartDetailQueryDto, @CurrentUser() user: AuthUser): Promise<PartDetailDto> {
    return this.parts.getDetail(id, user, query.ranges ? parseCovers(query.ranges, 'ranges') : []);
  }

  @Patch(':id')
  @Roles('engineer', 'admin')
  @ApiOperation({ summary: 'Edit a part: engineers their own drafts, admins any part; 409 PART_VERSION_CONFLICT on a stale version' })
  @ApiOkResponse({ type: PartDetailDto })
  update(@Param('id', ParseIdPipe) id: number, @Body() body: UpdatePartDto, @CurrentUser() user: AuthUser): Promise<PartDetailDto> {
    return this.parts.update(id, body, user);
  }

  @Get(':id/history')
  @Roles(...ALL_ROLES)
  @ApiOperation({ summary: "The part's audit history, newest first" })
  @ApiOkResponse({ type: AuditPageDto })
  history(@Param('id', ParseIdPipe) id: number, @Query() query: HistoryQueryDto): Promise<AuditPageDto> {
    return this.parts.history(id, query.limit, query.offset);
  }
}
