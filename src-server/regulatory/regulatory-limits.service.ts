import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import { NotFoundError, type FieldProblem, ValidationFailedError } from '../common/domain-error';
import type { AuthUser } from '../common/auth.decorators';
import { AuditService, diffFields } from '../audit/audit.service';
import { checkFrequencyWindow } from '../bands/bands.service';
import { LICENCE_EXEMPT_TECHNOLOGIES, RegulatoryLimit } from './regulatory-limit.entity';
import type { CreateRegulatoryLimitDto, RegulatoryLimitDto, RegulatoryLimitQueryDto, UpdateRegulatoryLimitDto } from './dto/regulatory-limit.dto';

const FIELDS: (keyof RegulatoryLimit)[] = [
  'region',
  'technologies',
  'title',
  'fromMhz',
  'toMhz',
  'kind',
  'valueDbm',
  'valueText',
  'gainThresholdDbi',
  'reductionDbPerDb',
  'conditions',
  'source',
  'note',
];

function toDto(limit: RegulatoryLimit): RegulatoryLimitDto {
  return {
    id: limit.id,
    region: limit.region,
    technologies: limit.technologies ?? [],
    title: limit.title,
    fromMhz: limit.fromMhz,
    toMhz: limit.toMhz,
    kind: limit.kind,
    valueDbm: limit.valueDbm,
    valueText: limit.valueText,
    gainThresholdDbi: limit.gainThresholdDbi,
    reductionDbPerDb: limit.reductionDbPerDb,
    conditions: limit.conditions,
    source: limit.source,
    note: limit.note,
    updatedAt: limit.updatedAt.toISOString(),
  };
}

/** Cross-field rules: a range with width, and the gain rule present exactly when the kind needs it. */
function checkLimit(limit: Pick<RegulatoryLimit, 'fromMhz' | 'toMhz' | 'kind' | 'gainThresholdDbi' | 'reductionDbPerDb'>): void {
  const problems: FieldProblem[] = [];
  if (!(limit.toMhz > limit.fromMhz)) problems.push({ field: 'toMhz', message: `must be above fromMhz (${limit.fromMhz})` });
  const gainRule = limit.kind === 'conducted-gain-rule';
  for (const field of ['gainThresholdDbi', 'reductionDbPerDb'] as const) {
    const present = limit[field] !== null && limit[field] !== undefined;
    if (gainRule && !present) problems.push({ field, message: 'is required for kind conducted-gain-rule' });
    if (!gainRule && present) problems.push({ field, message: `applies only to kind conducted-gain-rule, not ${limit.kind}` });
  }
  if (problems.length) throw new ValidationFailedError(problems);
}

@Injectable()
export class RegulatoryLimitsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly audit: AuditService,
  ) {}

  async list(query: RegulatoryLimitQueryDto = {}): Promise<RegulatoryLimitDto[]> {
    const window = checkFrequencyWindow(query.fromMhz, query.toMhz);
    const q = this.dataSource.getRepository(RegulatoryLimit).createQueryBuilder('l').orderBy('l.region').addOrderBy('l.from_mhz').addOrderBy('l.id');
    if (query.region) q.andWhere('l.region = :region', { region: query.region });
    if (query.technology) q.andWhere('JSON_CONTAINS(l.technologies, :technology)', { technology: JSON.stringify(query.technology) });
    if (window) q.andWhere('l.from_mhz <= :to AND l.to_mhz >= :from', { from: window.fromMhz, to: window.toMhz });
    return (await q.getMany()).map(toDto);
  }

  /**
   * Limits of one region (plus any marked global) whose range overlaps [fromMhz, toMhz] with some width,
   * or contains the frequency when fromMhz = toMhz.
   */
  async findApplicable(region: string, fromMhz: number, toMhz: number): Promise<RegulatoryLimitDto[]> {
    const point = fromMhz === toMhz;
    const rows = await this.dataSource
      .getRepository(RegulatoryLimit)
      .createQueryBuilder('l')
      .where('l.region IN (:...regions)', { regions: [region, 'global'] })
      .andWhere(point ? 'l.from_mhz <= :to AND l.to_mhz >= :from' : 'l.from_mhz < :to AND l.to_mhz > :from', { from: fromMhz, to: toMhz })
      .orderBy('l.from_mhz')
      .addOrderBy('l.id')
      .getMany();
    return rows.map(toDto);
  }

  async get(id: number): Promise<RegulatoryLimitDto> {
    const limit = await this.dataSource.getRepository(RegulatoryLimit).findOneBy({ id });
    if (!limit) throw new NotFoundError('regulatory limit', id);
    return toDto(limit);
  }

  async create(input: CreateRegulatoryLimitDto, actor: AuthUser): Promise<RegulatoryLimitDto> {
    const row = {
      ...input,
      technologies: input.technologies ?? [...LICENCE_EXEMPT_TECHNOLOGIES],
      gainThresholdDbi: input.gainThresholdDbi ?? null,
      reductionDbPerDb: input.reductionDbPerDb ?? null,
      conditions: input.conditions ?? null,
      note: input.note ?? null,
    };
    checkLimit(row);
    return this.dataSource.transaction(async (manager) => {
      const inserted = await manager.insert(RegulatoryLimit, row);
      const id = Number(inserted.identifiers[0].id);
      await this.audit.record(manager, { entityType: 'regulatory-limit', entityId: id, action: 'created', userId: actor.id, changes: { ...row } });
      return toDto(await manager.findOneByOrFail(RegulatoryLimit, { id }));
    });
  }

  async update(id: number, input: UpdateRegulatoryLimitDto, actor: AuthUser): Promise<RegulatoryLimitDto> {
    return this.dataSource.transaction(async (manager) => {
      const before = await manager.findOne(RegulatoryLimit, { where: { id }, lock: { mode: 'pessimistic_write' } });
      if (!before) throw new NotFoundError('regulatory limit', id);
      const patch = input as Partial<RegulatoryLimit>;
      checkLimit({ ...before, ...patch });
      const changes = diffFields(before, patch, FIELDS);
      if (Object.keys(changes).length) {
        await manager.update(RegulatoryLimit, { id }, patch);
        await this.audit.record(manager, { entityType: 'regulatory-limit', entityId: id, action: 'updated', userId: actor.id, changes });
      }
      return toDto(await manager.findOneByOrFail(RegulatoryLimit, { id }));
    });
  }

  async remove(id: number, actor: AuthUser): Promise<void> {
    await this.dataSource.transaction(async (manager) => {
      const before = await manager.findOneBy(RegulatoryLimit, { id });
      if (!before) throw new NotFoundError('regulatory limit', id);
      await manager.delete(RegulatoryLimit, { id });
      await this.audit.record(manager, { entityType: 'regulatory-limit', entityId: id, action: 'deleted', userId: actor.id, changes: { ...toDto(before) } });
    });
  }
}
