import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { Brackets, DataSource, EntityManager, In } from 'typeorm';
import { DomainError, NotFoundError, ValidationFailedError } from '../common/domain-error';
import type { AuthUser } from '../common/auth.decorators';
import { AuditService, diffFields } from '../audit/audit.service';
import { Band, BandRange } from './band.entity';
import type { BandDto } from './dto/band-response.dto';
import type { BandQueryDto } from './dto/band-query.dto';
import type { CreateBandDto, UpdateBandDto } from './dto/write-band.dto';

export function toBandDto(band: Band): BandDto {
  const ranges = [...(band.ranges ?? [])].sort((a, b) => a.position - b.position || a.fromMhz - b.fromMhz);
  return {
    id: band.id,
    technology: band.technology,
    designation: band.designation,
    name: band.name,
    ranges: ranges.map((r) => ({ role: r.role, fromMhz: r.fromMhz, toMhz: r.toMhz })),
    duplex: band.duplex,
    source: { document: band.sourceDocument, table: band.sourceTable, note: band.sourceNote },
    centreMhz: band.centreMhz,
    bandwidthMhz: band.bandwidthMhz,
    mainLobe: band.mainLobeFromMhz !== null && band.mainLobeToMhz !== null ? { fromMhz: band.mainLobeFromMhz, toMhz: band.mainLobeToMhz } : null,
    regions: band.regions ?? [],
  };
}

/** A range [from, to] given as query filters: both or neither, from ≤ to. */
export function checkFrequencyWindow(fromMhz: number | undefined, toMhz: number | undefined): { fromMhz: number; toMhz: number } | null {
  if (fromMhz === undefined && toMhz === undefined) return null;
  if (fromMhz === undefined) throw new ValidationFailedError([{ field: 'fromMhz', message: 'is required together with toMhz' }]);
  if (toMhz === undefined) throw new ValidationFailedError([{ field: 'toMhz', message: 'is required together with fromMhz' }]);
  if (toMhz < fromMhz) throw new ValidationFailedError([{ field: 'toMhz', message: `must not be below fromMhz (${fromMhz})` }]);
  return { fromMhz, toMhz };
}

const BAND_FIELDS: (keyof Band)[] = [
  'technology',
  'designation',
  'name',
  'duplex',
  'centreMhz',
  'bandwidthMhz',
  'mainLobeFromMhz',
  'mainLobeToMhz',
  'regions',
  'sourceDocument',
  'sourceTable',
  'sourceNote',
];

@Injectable()
export class BandsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly audit: AuditService,
  ) {}

  async list(query: BandQueryDto): Promise<BandDto[]> {
    const window = checkFrequencyWindow(query.fromMhz, query.toMhz);
    const ids = this.dataSource.getRepository(Band).createQueryBuilder('b').select('b.id', 'id');
    if (query.technology) ids.andWhere('b.technology = :technology', { technology: query.technology });
    if (query.designation) ids.andWhere('b.designation = :designation', { designation: query.designation.trim() });
    if (window) {
      // A zero-width window asks "which bands contain this frequency"; otherwise the overlap must have width.
      const touching = window.fromMhz === window.toMhz;
      ids.andWhere(
        new Brackets((w) =>
          w.where(
            `EXISTS (SELECT 1 FROM band_ranges r WHERE r.band_id = b.id AND ${touching ? 'r.from_mhz <= :to AND r.to_mhz >= :from' : 'r.from_mhz < :to AND r.to_mhz > :from'})`,
            { from: window.fromMhz, to: window.toMhz },
          ),
        ),
      );
    }
    const found: { id: number }[] = await ids.getRawMany();
    return this.findByIds(found.map((row) => Number(row.id)));
  }

  async get(id: number): Promise<BandDto> {
    const [band] = await this.findByIds([id]);
    if (!band) throw new NotFoundError('band', id);
    return band;
  }

  /** Bands with their ranges, in library order (technology, then id); unknown ids are simply absent. */
  async findByIds(ids: number[], manager: EntityManager = this.dataSource.manager): Promise<BandDto[]> {
    if (!ids.length) return [];
    const bands = await manager.find(Band, { where: { id: In([...new Set(ids)]) }, relations: { ranges: true }, order: { id: 'ASC' } });
    return bands.map(toBandDto);
  }

  async create(input: CreateBandDto, actor: AuthUser): Promise<BandDto> {
    checkRanges(input.ranges);
    checkMainLobe(input.technology, input.ranges, input.mainLobeFromMhz ?? null, input.mainLobeToMhz ?? null);
    return this.dataSource.transaction(async (manager) => {
      await this.assertDesignationFree(manager, input.designation);
      const inserted = await manager.insert(Band, {
        technology: input.technology,
        designation: input.designation,
        name: input.name,
        duplex: input.duplex,
        centreMhz: input.centreMhz ?? null,
        bandwidthMhz: input.bandwidthMhz ?? null,
        mainLobeFromMhz: input.mainLobeFromMhz ?? null,
        mainLobeToMhz: input.mainLobeToMhz ?? null,
        regions: input.regions,
        sourceDocument: input.sourceDocument,
        sourceTable: input.sourceTable,
        sourceNote: input.sourceNote ?? null,
      });
      const id = Number(inserted.identifiers[0].id);
      await manager.insert(
        BandRange,
        input.ranges.map((r, position) => ({ ...r, bandId: id, position })),
      );
      await this.audit.record(manager, { entityType: 'band', entityId: id, action: 'created', userId: actor.id, changes: { ...input } });
      return (await this.findByIds([id], manager))[0];
    });
  }

  async update(id: number, input: UpdateBandDto, actor: AuthUser): Promise<BandDto> {
    if (input.ranges) checkRanges(input.ranges);
    return this.dataSource.transaction(async (manager) => {
      // Lock the row first; MariaDB has no FOR UPDATE OF, so relations load in a second query.
      if (!(await manager.findOne(Band, { where: { id }, lock: { mode: 'pessimistic_write' } }))) throw new NotFoundError('band', id);
      const band = await manager.findOneOrFail(Band, { where: { id }, relations: { ranges: true } });
      checkMainLobe(
        input.technology ?? band.technology,
        input.ranges ?? band.ranges,
        input.mainLobeFromMhz !== undefined ? input.mainLobeFromMhz : band.mainLobeFromMhz,
        input.mainLobeToMhz !== undefined ? input.mainLobeToMhz : band.mainLobeToMhz,
      );
      if (input.designation && input.designation !== band.designation) await this.assertDesignationFree(manager, input.designation);
      const { ranges, ...fields } = input;
      const changes: Record<string, unknown> = diffFields(band, fields as Partial<Band>, BAND_FIELDS);
      if (Object.keys(fields).length) await manager.update(Band, { id }, fields as Partial<Band>);
      if (ranges) {
        const before = toBandDto(band).ranges;
        if (JSON.stringify(before) !== JSON.stringify(ranges.map((r) => ({ role: r.role, fromMhz: r.fromMhz, toMhz: r.toMhz }))))
          changes.ranges = [before, ranges];
        await manager.delete(BandRange, { bandId: id });
        await manager.insert(
          BandRange,
          ranges.map((r, position) => ({ ...r, bandId: id, position })),
        );
      }
      if (Object.keys(changes).length) await this.audit.record(manager, { entityType: 'band', entityId: id, action: 'updated', userId: actor.id, changes });
      return (await this.findByIds([id], manager))[0];
    });
  }

  async remove(id: number, actor: AuthUser): Promise<void> {
    await this.dataSource.transaction(async (manager) => {
      const band = await manager.findOne(Band, { where: { id }, relations: { ranges: true } });
      if (!band) throw new NotFoundError('band', id);
      try {
        await manager.delete(Band, { id });
      } catch (error) {
        if ((error as { code?: string }).code === 'ER_ROW_IS_REFERENCED_2') {
          throw new DomainError('BAND_IN_USE', `Band ${band.designation} is used by a band set or a radio; remove it there first`, 409);
        }
        throw error;
      }
      await this.audit.record(manager, { entityType: 'band', entityId: id, action: 'deleted', userId: actor.id, changes: { band: toBandDto(band) } });
    });
  }

  private async assertDesignationFree(manager: EntityManager, designation: string): Promise<void> {
    if (await manager.existsBy(Band, { designation })) {
      throw new DomainError('BAND_DESIGNATION_TAKEN', `A band ${designation} already exists`, 409, { field: 'designation' });
    }
  }
}

function checkRanges(ranges: { fromMhz: number; toMhz: number }[]): void {
  const problems = ranges.flatMap((r, i) => (r.toMhz > r.fromMhz ? [] : [{ field: `ranges.${i}.toMhz`, message: `must be above fromMhz (${r.fromMhz})` }]));
  if (problems.length) throw new ValidationFailedError(problems);
}

/** A main lobe is GNSS only, given with both edges, and lies inside one of the band's ranges. */
function checkMainLobe(technology: string, ranges: { fromMhz: number; toMhz: number }[], fromMhz: number | null, toMhz: number | null): void {
  if (fromMhz === null && toMhz === null) return;
  const problems: { field: string; message: string }[] = [];
  if (technology !== 'gnss') problems.push({ field: 'mainLobeFromMhz', message: `a main lobe belongs to a GNSS signal, not a ${technology} band` });
  else if (fromMhz === null) problems.push({ field: 'mainLobeFromMhz', message: 'is required together with mainLobeToMhz' });
  else if (toMhz === null) problems.push({ field: 'mainLobeToMhz', message: 'is required together with mainLobeFromMhz' });
  else if (!(toMhz > fromMhz)) problems.push({ field: 'mainLobeToMhz', message: `must be above mainLobeFromMhz (${fromMhz})` });
  else if (!ranges.some((r) => r.fromMhz <= fromMhz && toMhz <= r.toMhz))
    problems.push({ field: 'mainLobeFromMhz', message: `the main lobe ${fromMhz}–${toMhz} MHz must lie inside one of the band's ranges` });
  if (problems.length) throw new ValidationFailedError(problems);
}
