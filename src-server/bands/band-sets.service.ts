import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource, EntityManager, In, Not } from 'typeorm';
import { transactionWithRetry } from '../common/transaction-retry';
import { DomainError, NotFoundError, ValidationFailedError, VersionConflictError } from '../common/domain-error';
import type { AuthUser } from '../common/auth.decorators';
import { AuditService } from '../audit/audit.service';
import { Band } from './band.entity';
import { BandSet, BandSetMember } from './band-set.entity';
import type { BandSetDto, CreateBandSetDto, UpdateBandSetDto } from './dto/band-set.dto';

function toBandSetDto(set: BandSet): BandSetDto {
  const members = [...(set.members ?? [])].sort((a, b) => a.position - b.position);
  return {
    id: set.id,
    name: set.name,
    description: set.description,
    bandIds: members.map((m) => m.bandId),
    bands: members.map((m) => ({ id: m.band.id, technology: m.band.technology, designation: m.band.designation, name: m.band.name })),
    version: set.version,
    updatedAt: set.updatedAt.toISOString(),
  };
}

@Injectable()
export class BandSetsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly audit: AuditService,
  ) {}

  async list(): Promise<BandSetDto[]> {
    const sets = await this.dataSource.getRepository(BandSet).find({ relations: { members: { band: true } }, order: { name: 'ASC' } });
    return sets.map(toBandSetDto);
  }

  async get(id: number, manager: EntityManager = this.dataSource.manager): Promise<BandSetDto> {
    const set = await manager.findOne(BandSet, { where: { id }, relations: { members: { band: true } } });
    if (!set) throw new NotFoundError('band set', id);
    return toBandSetDto(set);
  }

  async create(input: CreateBandSetDto, actor: AuthUser): Promise<BandSetDto> {
    return transactionWithRetry(this.dataSource, async (manager) => {
      await this.assertNameFree(manager, input.name);
      await this.assertBandsExist(manager, input.bandIds);
      const inserted = await manager.insert(BandSet, { name: input.name, description: input.description });
      const id = Number(inserted.identifiers[0].id);
      await this.writeMembers(manager, id, input.bandIds);
      await this.audit.record(manager, { entityType: 'band-set', entityId: id, action: 'created', userId: actor.id, changes: { ...input } });
      return this.get(id, manager);
    });
  }

  async update(id: number, input: UpdateBandSetDto, actor: AuthUser): Promise<BandSetDto> {
    return transactionWithRetry(this.dataSource, async (manager) => {
      await this.lockBandSet(manager, id, input.version);
      const before = await manager.findOneOrFail(BandSet, { where: { id }, relations: { members: { band: true } } });
      const old = toBandSetDto(before);
      if (input.name !== undefined && input.name !== before.name) await this.assertNameFree(manager, input.name, id);
      const changes: Record<string, [unknown, unknown]> = {};
      const fields: Partial<BandSet> = {};
      if (input.name !== undefined && input.name !== old.name) {
        fields.name = input.name;
        changes.name = [old.name, input.name];
      }
      if (input.description !== undefined && input.description !== old.description) {
        fields.description = input.description;
        changes.description = [old.description, input.description];
      }
      if (input.bandIds && JSON.stringify(input.bandIds) !== JSON.stringify(old.bandIds)) {
        await this.assertBandsExist(manager, input.bandIds);
        await manager.delete(BandSetMember, { bandSetId: id });
        await this.writeMembers(manager, id, input.bandIds);
        changes.bandIds = [old.bandIds, input.bandIds];
      }
      if (Object.keys(changes).length) {
        await manager.update(BandSet, { id }, { ...fields, version: before.version + 1 });
        await this.audit.record(manager, { entityType: 'band-set', entityId: id, action: 'updated', userId: actor.id, changes });
      }
      return this.get(id, manager);
    });
  }

  async remove(id: number, version: number | undefined, actor: AuthUser): Promise<void> {
    await this.dataSource.transaction(async (manager) => {
      await this.lockBandSet(manager, id, version);
      const set = await this.get(id, manager);
      await manager.delete(BandSet, { id });
      await this.audit.record(manager, {
        entityType: 'band-set',
        entityId: id,
        action: 'deleted',
        userId: actor.id,
        changes: { name: set.name, bandIds: set.bandIds },
      });
    });
  }

  /** Locks the row first; MariaDB has no FOR UPDATE OF, so callers load relations in a second query. */
  private async lockBandSet(manager: EntityManager, id: number, expectedVersion: number | undefined): Promise<BandSet> {
    const set = await manager.findOne(BandSet, { where: { id }, lock: { mode: 'pessimistic_write' } });
    if (!set) throw new NotFoundError('band set', id);
    if (expectedVersion !== undefined && expectedVersion !== set.version) throw new VersionConflictError('band set', id, expectedVersion, set.version);
    return set;
  }

  private async writeMembers(manager: EntityManager, bandSetId: number, bandIds: number[]): Promise<void> {
    await manager.insert(
      BandSetMember,
      bandIds.map((bandId, position) => ({ bandSetId, bandId, position })),
    );
  }

  private async assertNameFree(manager: EntityManager, name: string, exceptId?: number): Promise<void> {
    if (await manager.existsBy(BandSet, { name, ...(exceptId ? { id: Not(exceptId) } : {}) })) {
      throw new DomainError('BAND_SET_NAME_TAKEN', `A band set named "${name}" already exists`, 409, { field: 'name' });
    }
  }

  private async assertBandsExist(manager: EntityManager, bandIds: number[]): Promise<void> {
    const known = new Set((await manager.find(Band, { select: { id: true }, where: { id: In(bandIds) } })).map((b) => b.id));
    const seen = new Set<number>();
    const problems = bandIds.flatMap((bandId, i) => {
      if (!known.has(bandId)) return [{ field: `bandIds.${i}`, message: `band ${bandId} is not in the band library` }];
      if (seen.has(bandId)) return [{ field: `bandIds.${i}`, message: `band ${bandId} is listed twice` }];
      seen.add(bandId);
      return [];
    });
    if (problems.length) throw new ValidationFailedError(problems);
  }
}
