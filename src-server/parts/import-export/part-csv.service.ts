import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import type { AuthUser } from '../../common/auth.decorators';
import { DomainError } from '../../common/domain-error';
import { CatalogueSearchService } from '../catalogue/catalogue-index/catalogue-search.service';
import { looksBinary } from '../../storage/limited-file-upload';
import { type UploadedFile, requireFile } from '../../storage/uploaded-file';
import { Part } from '../part.entity';
import { type ImportProblem, PART_CSV_COLUMNS, formatSpecBands, parsePartCsv } from './part-csv';
import { writeCsv } from '../../common/csv-writer';
import { PartsService } from '../catalogue/parts.service';
import type { PartSearchDto } from '../dto/part-search.dto';
import type { ImportResultDto } from '../dto/import.dto';

const EXPORT_COLUMNS = ['id', ...PART_CSV_COLUMNS, 'reviewState', 'measuredKinds', 'lowestPrices'] as const;

/** A catalogue import is a few thousand rows of text; anything bigger is a mistake. */
export const PART_IMPORT_MAX_BYTES = 4 * 1024 * 1024;

@Injectable()
export class PartCsvService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly parts: PartsService,
    private readonly search: CatalogueSearchService,
  ) {}

  /** Every problem by row first; a real import writes all rows in one transaction or none. */
  async importCsv(maybeFile: UploadedFile | undefined, dryRun: boolean, actor: AuthUser): Promise<ImportResultDto> {
    const file = requireFile(maybeFile);
    if (file.size > PART_IMPORT_MAX_BYTES) {
      throw new DomainError(
        'PART_IMPORT_TOO_LARGE',
        `file: an import may be at most ${PART_IMPORT_MAX_BYTES / 1048576} MiB; split it, nothing was imported`,
        413,
        { field: 'file', limitBytes: PART_IMPORT_MAX_BYTES },
      );
    }
    if (looksBinary(file.buffer)) {
      throw new DomainError('PART_IMPORT_NOT_CSV', `file: ${file.originalname} is not a CSV text file; nothing was imported`, 415, { field: 'file' });
    }
    const { parts, problems } = parsePartCsv(file.buffer);
    if (parts.length > 0) {
      const existing: { name: string; mpn: string }[] = await this.dataSource.query(
        'SELECT m.name, p.mpn FROM parts p JOIN manufacturers m ON m.id = p.manufacturer_id WHERE p.mpn IN (?)',
        [parts.map((p) => p.input.mpn)],
      );
      const taken = new Set(existing.map((e) => `${e.name.toLowerCase()}\u0000${e.mpn}`));
      for (const part of parts) {
        if (taken.has(`${part.input.manufacturer.trim().toLowerCase()}\u0000${part.input.mpn}`)) {
          problems.push({ row: part.row, line: part.line, field: 'mpn', message: `${part.input.manufacturer} ${part.input.mpn} is already in the catalogue` });
        }
      }
    }
    problems.sort((a, b) => a.row - b.row);
    const badRows = new Set(problems.map((p) => p.row));
    const partRows = new Set(parts.map((p) => p.row));
    const rowCount = parts.length + new Set(problems.filter((p) => p.row > 0 && !partRows.has(p.row)).map((p) => p.row)).size;
    const valid = parts.filter((p) => !badRows.has(p.row)).length;
    if (dryRun) return { dryRun: true, rowCount, validRows: valid, problems, createdIds: [] };
    if (problems.length > 0) {
      throw new DomainError(
        'PART_IMPORT_INVALID',
        `${problems.length} problem${problems.length === 1 ? '' : 's'} in the file; nothing was imported. First: row ${problems[0].row}, ${problems[0].field}: ${problems[0].message}`,
        422,
        { line: problems[0].line, problems },
      );
    }
    const createdIds = await this.dataSource.transaction(async (manager) => {
      const ids: number[] = [];
      for (const part of parts) {
        try {
          ids.push(await this.parts.createIn(manager, part.input, actor.id, 'imported'));
        } catch (error) {
          // A row that passed the dry run can still collide with a part created meanwhile.
          if (error instanceof DomainError) {
            const problem: ImportProblem = { row: part.row, line: part.line, field: String(error.details.field ?? ''), message: error.message };
            throw new DomainError('PART_IMPORT_INVALID', `row ${part.row}: ${error.message}; nothing was imported`, 422, {
              line: part.line,
              problems: [problem],
            });
          }
          throw error;
        }
      }
      return ids;
    });
    return { dryRun: false, rowCount, validRows: valid, problems: [], createdIds };
  }

  /** The current search (same filters and order), unpaged, as CSV. */
  async exportCsv(dto: PartSearchDto, actor: AuthUser): Promise<string> {
    const matches = await this.search.searchAll(dto, actor);
    const rows: unknown[][] = [];
    const byId = new Map<number, Part>();
    for (let i = 0; i < matches.length; i += 1000) {
      const ids = matches.slice(i, i + 1000).map((p) => p.id);
      const rows = await this.dataSource.getRepository(Part).find({ where: ids.map((id) => ({ id })), relations: { manufacturer: true, specBands: true } });
      for (const row of rows) byId.set(row.id, row);
    }
    for (const indexed of matches) {
      const part = byId.get(indexed.id);
      if (!part) continue;
      const bands = [...part.specBands].sort((a, b) => a.fromMhz - b.fromMhz);
      rows.push([
        part.id,
        part.manufacturer.name,
        part.mpn,
        part.title,
        part.formFactor,
        part.connector,
        part.polarization,
        part.mounting,
        part.nominalImpedanceOhms,
        part.lengthMm,
        part.widthMm,
        part.heightMm,
        part.evalGroundLengthMm,
        part.evalGroundWidthMm,
        part.tempMinC,
        part.tempMaxC,
        part.lifecycle,
        part.notes,
        formatSpecBands(bands),
        part.reviewState,
        indexed.measuredKinds.join(' '),
        [...indexed.lowestPrices].map(([currency, price]) => `${price.toFixed(4)} ${currency}`).join(' '),
      ]);
    }
    // The header keeps the import's column names, so an exported file imports again as it is.
    return writeCsv(EXPORT_COLUMNS, rows);
  }
}
