import { createHash } from 'node:crypto';
import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource, EntityManager } from 'typeorm';
import { AuditService } from '../audit/audit.service';
import type { AuthUser } from '../common/auth.decorators';
import { LruMap } from '../common/revision-cache';
import { DomainError, NotFoundError, ValidationFailedError, VersionConflictError } from '../common/domain-error';
import { CompiledRuleSet } from './engine/compiled-evaluator';
import { type RuleDefinition, type RuleProblem, validateRuleDefinition } from './engine/rule-definition';
import { StoredRule, StoredRuleVersion, type RuleVersionAction } from './compatibility.entities';
import type { RuleDetailDto, RuleOrigin, RuleSummaryDto, RuleValidationDto, RuleVersionDto } from './dto/rule.dto';
import { loadRuleFiles } from './rule-files';

export interface EffectiveRule {
  readonly rule: RuleDefinition;
  readonly origin: RuleOrigin;
  readonly updatedAt: Date | null;
}

const RULE_ID = /^[a-z0-9][a-z0-9-]{1,62}[a-z0-9]$/;

function invalid(problems: RuleProblem[]): ValidationFailedError {
  return new ValidationFailedError(problems.map((p) => ({ field: p.path ? `definition.${p.path}` : 'definition', message: p.message })));
}

/** The rule set: rules/*.json, with admin edits and admin-made rules from the database taking precedence. */
@Injectable()
export class RulesService {
  private readonly fileRules: ReadonlyMap<string, RuleDefinition>;
  /** Compiled rule sets by a hash of their content: never stale, only bounded. */
  private readonly compiled = new LruMap<string, CompiledRuleSet>(20);

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly audit: AuditService,
  ) {
    this.fileRules = new Map(loadRuleFiles().map((r) => [r.id, r]));
  }

  async effectiveRules(manager: EntityManager = this.dataSource.manager): Promise<EffectiveRule[]> {
    const stored = await manager.find(StoredRule, { order: { ruleKey: 'ASC' } });
    const byKey = new Map(stored.map((s) => [s.ruleKey, s]));
    const rules: EffectiveRule[] = [];
    for (const [id, rule] of this.fileRules) {
      const edit = byKey.get(id);
      rules.push(
        edit
          ? { rule: { ...edit.definition, enabled: edit.enabled, version: edit.version }, origin: 'file-edited', updatedAt: edit.updatedAt }
          : { rule, origin: 'file', updatedAt: null },
      );
    }
    for (const s of stored)
      if (!this.fileRules.has(s.ruleKey))
        rules.push({ rule: { ...s.definition, enabled: s.enabled, version: s.version }, origin: 'admin', updatedAt: s.updatedAt });
    return rules.sort((a, b) => (a.rule.id < b.rule.id ? -1 : a.rule.id > b.rule.id ? 1 : 0));
  }

  /** The compiled fast path for a rule list, kept while the rules' content is the same (a previewed edit keeps id and version). */
  compile(rules: readonly RuleDefinition[]): CompiledRuleSet {
    const signature = createHash('sha256').update(JSON.stringify(rules)).digest('hex');
    let set = this.compiled.get(signature);
    if (!set) {
      set = new CompiledRuleSet(rules);
      this.compiled.set(signature, set);
    }
    return set;
  }

  async currentRuleSet(): Promise<{ rules: RuleDefinition[]; compiled: CompiledRuleSet; signature: string }> {
    const rules = (await this.effectiveRules()).map((e) => e.rule);
    return { rules, compiled: this.compile(rules), signature: rulesSignature(rules) };
  }

  async list(): Promise<RuleSummaryDto[]> {
    return (await this.effectiveRules()).map(toSummary);
  }

  async get(id: string): Promise<RuleDetailDto> {
    const found = (await this.effectiveRules()).find((e) => e.rule.id === id);
    if (!found) throw new NotFoundError('rule', id);
    return { ...toSummary(found), definition: found.rule as unknown as Record<string, unknown> };
  }

  validate(definition: unknown): RuleValidationDto {
    const problems = validateRuleDefinition(definition);
    return { valid: problems.length === 0, problems };
  }

  /** Validates and normalises a rule before it may be previewed or saved; throws naming every problem. */
  checked(definition: unknown): RuleDefinition {
    const problems = validateRuleDefinition(definition);
    if (problems.length > 0) throw invalid(problems);
    return definition as RuleDefinition;
  }

  async create(definition: unknown, actor: AuthUser): Promise<RuleDetailDto> {
    const rule = this.checked({ ...(definition as object), version: 1 });
    await this.dataSource.transaction(async (manager) => {
      if (this.fileRules.has(rule.id) || (await manager.existsBy(StoredRule, { ruleKey: rule.id }))) {
        throw new DomainError('RULE_ID_TAKEN', `a rule with id "${rule.id}" already exists; edit it instead`, 409, { field: 'definition.id' });
      }
      await manager.insert(StoredRule, { ruleKey: rule.id, origin: 'admin', definition: rule, version: 1, enabled: rule.enabled, updatedById: actor.id });
      await this.recordVersion(manager, rule, 'created', actor);
    });
    return this.get(rule.id);
  }

  async update(id: string, definition: unknown, expectedVersion: number, actor: AuthUser): Promise<RuleDetailDto> {
    if (!RULE_ID.test(id)) throw new NotFoundError('rule', id);
    await this.dataSource.transaction(async (manager) => {
      const current = await this.lockCurrent(manager, id);
      if (current.version !== expectedVersion) throw new VersionConflictError('rule', id, expectedVersion, current.version);
      const draft = definition as Partial<RuleDefinition>;
      if (draft.id !== undefined && draft.id !== id)
        throw new ValidationFailedError([{ field: 'definition.id', message: `a rule keeps its id; this one is "${id}"` }]);
      const rule = this.checked({ ...(definition as object), id, version: current.version + 1 });
      await this.saveNewVersion(manager, current, rule, 'edited', actor);
    });
    return this.get(id);
  }

  async setEnabled(id: string, enabled: boolean, expectedVersion: number, actor: AuthUser): Promise<RuleDetailDto> {
    await this.dataSource.transaction(async (manager) => {
      const current = await this.lockCurrent(manager, id);
      if (current.version !== expectedVersion) throw new VersionConflictError('rule', id, expectedVersion, current.version);
      if (current.rule.enabled === enabled) return;
      await this.saveNewVersion(manager, current, { ...current.rule, enabled, version: current.version + 1 }, enabled ? 'enabled' : 'disabled', actor);
    });
    return this.get(id);
  }

  async versions(id: string): Promise<RuleVersionDto[]> {
    const rows = await this.dataSource
      .getRepository(StoredRuleVersion)
      .find({ where: { ruleKey: id }, relations: { changedBy: true }, order: { version: 'DESC' } });
    if (rows.length === 0) {
      const file = this.fileRules.get(id);
      if (!file) throw new NotFoundError('rule', id);
      return [{ version: file.version, action: 'file', changedBy: null, at: null, definition: file as unknown as Record<string, unknown> }];
    }
    return rows.map((r) => ({
      version: r.version,
      action: r.action,
      changedBy: r.changedBy?.name ?? null,
      at: r.action === 'file' ? null : r.createdAt.toISOString(),
      definition: r.definition as unknown as Record<string, unknown>,
    }));
  }

  private async lockCurrent(manager: EntityManager, id: string): Promise<{ rule: RuleDefinition; version: number; stored: StoredRule | null }> {
    const stored = await manager.findOne(StoredRule, { where: { ruleKey: id }, lock: { mode: 'pessimistic_write' } });
    if (stored) return { rule: { ...stored.definition, enabled: stored.enabled, version: stored.version }, version: stored.version, stored };
    const file = this.fileRules.get(id);
    if (!file) throw new NotFoundError('rule', id);
    return { rule: file, version: file.version, stored: null };
  }

  private async saveNewVersion(
    manager: EntityManager,
    current: { rule: RuleDefinition; stored: StoredRule | null },
    rule: RuleDefinition,
    action: RuleVersionAction,
    actor: AuthUser,
  ): Promise<void> {
    if (current.stored) {
      await manager.update(StoredRule, { ruleKey: rule.id }, { definition: rule, version: rule.version, enabled: rule.enabled, updatedById: actor.id });
    } else {
      // First change to a file rule: keep the file's own version in the history, then the edit.
      await manager.insert(StoredRule, {
        ruleKey: rule.id,
        origin: 'file',
        definition: rule,
        version: rule.version,
        enabled: rule.enabled,
        updatedById: actor.id,
      });
      await manager.insert(StoredRuleVersion, { ruleKey: rule.id, version: current.rule.version, action: 'file', definition: current.rule, changedById: null });
    }
    await this.recordVersion(manager, rule, action, actor);
  }

  private async recordVersion(manager: EntityManager, rule: RuleDefinition, action: RuleVersionAction, actor: AuthUser): Promise<void> {
    await manager.insert(StoredRuleVersion, { ruleKey: rule.id, version: rule.version, action, definition: rule, changedById: actor.id });
    await this.audit.record(manager, {
      entityType: 'rule',
      entityId: rule.id,
      action,
      userId: actor.id,
      changes: { version: rule.version, enabled: rule.enabled },
    });
  }
}

export function rulesSignature(rules: readonly RuleDefinition[]): string {
  return rules.map((r) => `${r.id}@${r.version}${r.enabled ? '' : '-off'}`).join(',');
}

function toSummary(e: EffectiveRule): RuleSummaryDto {
  const r = e.rule;
  return {
    id: r.id,
    title: r.title,
    description: r.description,
    severity: r.severity,
    enabled: r.enabled,
    version: r.version,
    source: r.source,
    origin: e.origin,
    updatedAt: e.updatedAt ? e.updatedAt.toISOString() : null,
  };
}
