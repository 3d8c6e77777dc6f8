import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import { duplicateKeyName } from '../common/duplicate-key';
import { RevisionCache, type RevisionReader } from '../common/revision-cache';
import { catalogueRevisionReader } from '../parts/catalogue-revision';
import { isRetryableLockError, transactionWithRetry } from '../common/transaction-retry';
import { AuditService, type AuditEntryView } from '../audit/audit.service';
import type { AuthUser } from '../common/auth.decorators';
import { DomainError, NotFoundError } from '../common/domain-error';
import { type PartEvaluationData as CataloguePart, PartDataService } from '../parts/part-data.service';
import { ProductsService } from '../products/products.service';
import type { ProductDetailDto } from '../products/dto/product.dto';
import { RegulatoryLimitsService } from '../regulatory/regulatory-limits.service';
import { PartAssignment } from './compatibility.entities';
import type { RuleDefinition } from './engine/rule-definition';
import type { CompiledRuleSet } from './engine/compiled-evaluator';
import { FactsCache, evaluateMatrix, rankCandidates } from './engine/matrix';
import type { Polarization, PartEvaluationData, RadioBandRequirement, RegulatoryLimit, Technology } from './engine/types';
import type { AssignmentDto, CandidatesDto, MatrixColumnDto, MatrixDto } from './dto/matrix.dto';
import type { CellChangeDto, RulePreviewDto } from './dto/rule.dto';
import { RulesService } from './rules.service';

const MHZ = 1e6;

interface PartColumn {
  readonly data: PartEvaluationData;
  readonly manufacturer: string;
}

function toEvaluationData(part: CataloguePart): PartColumn {
  const board = part.evalGroundPlane;
  return {
    manufacturer: part.manufacturer,
    data: {
      partId: part.id,
      mpn: part.mpn,
      title: part.title,
      reflection: part.s11?.curve ?? null,
      radiationEfficiencyPercent: part.efficiency?.curve ?? null,
      peakGainDbi: part.peakGain?.curve ?? null,
      averageGainDbi: part.averageGain?.curve ?? null,
      specBands: part.specBands.map((b) => ({ fromHz: b.fromHz, toHz: b.toHz, maxVswr: b.maxVswr, minReturnLossDb: b.minReturnLossDb, efficiencyPercent: b.efficiencyPct, peakGainDbi: b.peakGainDbi, averageGainDbi: b.averageGainDbi })),
      evaluationGroundPlane: board && board.lengthMm !== null && board.widthMm !== null ? { lengthMm: board.lengthMm, widthMm: board.widthMm } : null,
      polarization: part.polarization.toLowerCase() as Polarization,
      reviewState: part.reviewState,
      lifecycle: part.lifecycle,
    },
  };
}

/** The product's radio bands as the engine reads them; limits of the product's regions (and global ones). */
function requirementsOf(product: ProductDetailDto, limits: readonly RegulatoryLimit[], regionsOfLimits: readonly string[]): RadioBandRequirement[] {
  const regions = new Set([...product.targetRegions, 'global']);
  const applicable = limits.filter((_, i) => regions.has(regionsOfLimits[i]));
  return product.radios.flatMap((radio) =>
    radio.bands.map((rb) => ({
      radioId: radio.id,
      radioName: radio.name,
      technology: radio.technology as Technology,
      bandId: rb.band.id,
      designation: rb.band.designation,
      ranges: rb.band.ranges.map((r) => ({ fromHz: r.fromMhz * MHZ, toHz: r.toMhz * MHZ, role: r.role })),
      txPowerDbm: radio.receiveOnly ? null : radio.transmitPowerDbm,
      certifiedMaxGainDbi: rb.certifiedMaxGainDbi,
      feedLossDb: radio.feedLossDb,
      requiredPolarization: radio.polarization === 'any' ? null : (radio.polarization.toLowerCase() as Polarization),
      productGroundPlane: { lengthMm: product.groundPlaneLengthMm, widthMm: product.groundPlaneWidthMm },
      regulatoryLimits: applicable,
    })),
  );
}

const assignmentDto = (a: PartAssignment, part: { mpn: string; title: string } | undefined): AssignmentDto => ({
  id: a.id, productId: a.productId, radioId: a.radioId, partId: a.partId, mpn: part?.mpn ?? '', title: part?.title ?? '', state: a.state, note: a.note, updatedAt: a.updatedAt.toISOString(),
});

const COLUMN_CACHE_SIZE = 2000;
const MATRIX_CACHE_SIZE = 200;
const FACTS_CACHE_SIZE = 600_000;

/** The compatibility matrix, candidates and assignments over the products, parts and rules of the other domains. */
const ASSIGNMENT_ATTEMPTS = 6;
// Parallel shortlist/choice calls on one radio deadlock on gap locks or collide on a unique key; rerun, they then see the winner's row.
const retryAssignmentRace = (error: unknown) => isRetryableLockError(error) || (duplicateKeyName(error) ?? '').startsWith('uq_assignment_');

@Injectable()
export class CompatibilityService {
  // Every cache below holds values of one catalogue revision: the one its caller read before computing.
  /** Facts per (band requirement × part): one FactsCache per catalogue revision. */
  private readonly facts = new RevisionCache<FactsCache>(1);
  /** Evaluation data of parts asked for by id (matrix columns). */
  private readonly columns = new RevisionCache<PartColumn, number>(COLUMN_CACHE_SIZE);
  /** Matrices by product, asked parts, rule signature and the fingerprint of everything else they read. */
  private readonly matrices = new RevisionCache<MatrixDto>(MATRIX_CACHE_SIZE);
  /** The approved catalogue the candidates are ranked from. */
  private readonly catalogue = new RevisionCache<PartColumn[]>(1);
  private readonly catalogueRevision: RevisionReader;

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly rules: RulesService,
    private readonly products: ProductsService,
    private readonly partData: PartDataService,
    private readonly limits: RegulatoryLimitsService,
    private readonly audit: AuditService,
  ) {
    this.catalogueRevision = catalogueRevisionReader(dataSource);
  }

  /** The facts of `revision`; a caller holding an older revision gets a cache of its own that nobody else reads. */
  private factsAt(revision: number): FactsCache {
    return this.facts.getOrCreate('facts', revision, () => new FactsCache(FACTS_CACHE_SIZE));
  }

  private partKey = (part: PartEvaluationData) => String(part.partId);

  private async requirements(product: ProductDetailDto): Promise<RadioBandRequirement[]> {
    const limits = await this.limits.list();
    return requirementsOf(
      product,
      limits.map((l) => ({ region: l.region, fromHz: l.fromMhz * MHZ, toHz: l.toMhz * MHZ, kind: l.kind, valueDbm: l.valueDbm, source: l.source, gainThresholdDbi: l.gainThresholdDbi, reductionDbPerDb: l.reductionDbPerDb })),
      limits.map((l) => l.region),
    );
  }

  private async assignedPartIds(productId: number): Promise<number[]> {
    const rows = await this.dataSource.getRepository(PartAssignment).find({ where: { productId }, order: { radioId: 'ASC', state: 'DESC', id: 'ASC' } });
    // Chosen parts first (radio order), then the shortlist.
    return [...new Set([...rows.filter((r) => r.state === 'chosen'), ...rows.filter((r) => r.state === 'shortlisted')].map((r) => r.partId))];
  }

  /** The parts' evaluation data, loaded after `revision` was read. */
  private async partColumns(ids: number[], revision: number): Promise<PartColumn[]> {
    const columns = new Map<number, PartColumn>();
    for (const id of ids) {
      const cached = this.columns.get(id, revision);
      if (cached) columns.set(id, cached);
    }
    const unknown = ids.filter((id) => !columns.has(id));
    if (unknown.length > 0) {
      const found = await this.partData.getPartData(unknown);
      const missing = unknown.filter((id) => !found.some((p) => p.id === id));
      if (missing.length > 0) throw new DomainError('PART_NOT_FOUND', `part ${missing.join(', ')} was not found`, 404, { field: 'parts', missing });
      for (const part of found) {
        const column = toEvaluationData(part);
        columns.set(part.id, column);
        this.columns.set(part.id, revision, column);
      }
    }
    return ids.map((id) => columns.get(id)!);
  }

  /**
   * Everything a product's matrix depends on, read in one query so that every API instance sees a change
   * made through any other: the product, its radios and their bands, its assignments, the band ranges,
   * the regulatory limits and the catalogue revision (rules are keyed by their own signature).
   */
  private async matrixFingerprint(productId: number): Promise<{ fingerprint: string; revision: number }> {
    const [row] = await this.dataSource.query(
      `SELECT
         (SELECT CONCAT(version, '/', updated_at) FROM products WHERE id = ? AND deleted_at IS NULL) AS product,
         (SELECT CONCAT(COUNT(*), '/', COALESCE(SUM(version), 0), '/', COALESCE(MAX(updated_at), '')) FROM radios WHERE product_id = ?) AS radios,
         (SELECT CONCAT(COUNT(*), '/', COALESCE(SUM(CRC32(CONCAT_WS(',', rb.radio_id, rb.band_id, COALESCE(rb.certified_max_gain_dbi, 'n'), rb.position))), 0))
            FROM radio_bands rb JOIN radios r ON r.id = rb.radio_id WHERE r.product_id = ?) AS radioBands,
         (SELECT CONCAT(COUNT(*), '/', COALESCE(MAX(updated_at), ''), '/', COALESCE(SUM(CRC32(CONCAT_WS(',', id, part_id, radio_id, state))), 0)) FROM part_assignments WHERE product_id = ?) AS assignments,
         (SELECT CONCAT(COUNT(*), '/', COALESCE(SUM(CRC32(CONCAT_WS(',', id, band_id, role, from_mhz, to_mhz))), 0)) FROM band_ranges) AS bandRanges,
         (SELECT CONCAT(COUNT(*), '/', COALESCE(MAX(updated_at), '')) FROM bands) AS bands,
         (SELECT CONCAT(COUNT(*), '/', COALESCE(MAX(updated_at), '')) FROM regulatory_limits) AS limits,
         (SELECT revision FROM catalogue_revision WHERE id = 1) AS catalogue`,
      [productId, productId, productId, productId],
    );
    if (row.product === null) throw new NotFoundError('product', productId);
    return { fingerprint: Object.values(row).map(String).join('|'), revision: Number(row.catalogue) };
  }

  /** The matrix of a product; answers are reused until the fingerprint, the catalogue revision or the rules change. */
  async matrix(productId: number, partIds?: number[], rules?: RuleDefinition[]): Promise<MatrixDto> {
    if (rules) return this.computeMatrix(productId, partIds, { compiled: this.rules.compile(rules), signature: '' }, await this.catalogueRevision.current());
    const ruleSet = await this.rules.currentRuleSet();
    const { fingerprint, revision } = await this.matrixFingerprint(productId);
    const key = `${productId}|${partIds?.join(',') ?? '*'}|${ruleSet.signature}|${fingerprint}`;
    return this.matrices.getOrLoad(key, revision, () => this.computeMatrix(productId, partIds, ruleSet, revision));
  }

  /** Everything read here is read after `revision` was, so the matrix is at least that new. */
  private async computeMatrix(productId: number, partIds: number[] | undefined, ruleSet: { compiled: CompiledRuleSet; signature: string }, revision: number): Promise<MatrixDto> {
    const product = await this.products.getWithRadios(productId);
    const ids = partIds ?? (await this.assignedPartIds(productId));
    const columns = await this.partColumns(ids, revision);
    const requirements = await this.requirements(product);
    const matrix = evaluateMatrix(requirements, columns.map((c) => c.data), ruleSet.compiled, { cache: this.factsAt(revision), partKey: this.partKey });
    const assignments = await this.dataSource.getRepository(PartAssignment).find({ where: { productId } });
    return {
      productId,
      productName: product.name,
      rows: matrix.rows.map((r) => ({ ...r, ranges: r.ranges.map((x) => ({ ...x })) })),
      columns: columns.map((c): MatrixColumnDto => ({
        partId: c.data.partId, mpn: c.data.mpn, title: c.data.title, manufacturer: c.manufacturer, reviewState: c.data.reviewState, lifecycle: c.data.lifecycle,
        assignments: assignments.filter((a) => a.partId === c.data.partId).map((a) => ({ radioId: a.radioId, state: a.state })),
      })),
      cells: matrix.cells.map((c) => ({ ...c, findings: [...c.findings] })),
      rules: ruleSet.signature,
    };
  }

  /** The approved catalogue at `revision`, reloaded only when the catalogue revision moved. */
  private approvedCatalogue(revision: number): Promise<PartColumn[]> {
    return this.catalogue.getOrLoad('approved', revision, async () => (await this.partData.loadCatalogueForEvaluation(['approved'])).map(toEvaluationData));
  }

  async candidates(productId: number, radioId: number, limit = 20): Promise<CandidatesDto> {
    const product = await this.products.getWithRadios(productId);
    const radio = product.radios.find((r) => r.id === radioId);
    if (!radio) throw new NotFoundError('radio', radioId);
    const requirements = (await this.requirements(product)).filter((r) => r.radioId === radioId);
    const revision = await this.catalogueRevision.current();
    const catalogue = await this.approvedCatalogue(revision);
    const { compiled } = await this.rules.currentRuleSet();
    const ranked = rankCandidates(requirements, catalogue.map((c) => c.data), compiled, { cache: this.factsAt(revision), partKey: this.partKey, limit });
    const manufacturers = new Map(catalogue.map((c) => [c.data.partId, c.manufacturer]));
    const assignments = await this.dataSource.getRepository(PartAssignment).find({ where: { radioId } });
    return {
      productId,
      radioId,
      radioName: radio.name,
      evaluated: catalogue.length,
      candidates: ranked.map((c) => ({
        partId: c.partId, mpn: c.mpn, title: c.title, manufacturer: manufacturers.get(c.partId) ?? '', status: c.status, marginDb: c.marginDb,
        deciding: c.deciding, assignment: assignments.find((a) => a.partId === c.partId)?.state ?? null,
        bands: c.bands.map((b) => ({ ...b, findings: [...b.findings] })),
      })),
    };
  }

  /** Which cells of which products change when `rule` replaces (or joins) the current rules. */
  async previewRule(definition: unknown): Promise<RulePreviewDto> {
    const rule = this.rules.checked(definition);
    const before = (await this.rules.effectiveRules()).map((e) => e.rule);
    const after = before.some((r) => r.id === rule.id) ? before.map((r) => (r.id === rule.id ? rule : r)) : [...before, rule];
    const products = await this.products.list();
    const changes: CellChangeDto[] = [];
    let cellsCompared = 0;
    for (const summary of products) {
      const ids = await this.assignedPartIds(summary.id);
      if (ids.length === 0) continue;
      const [old, next] = [await this.matrix(summary.id, ids, before), await this.matrix(summary.id, ids, after)];
      cellsCompared += old.cells.length;
      old.cells.forEach((cell, i) => {
        const changed = next.cells[i];
        if (cell.status === changed.status) return;
        const row = old.rows[cell.row];
        const column = old.columns[cell.column];
        changes.push({
          productId: summary.id, productName: summary.name, radioId: row.radioId, radioName: row.radioName, bandId: row.bandId, designation: row.designation,
          partId: column.partId, mpn: column.mpn, before: cell.status, after: changed.status,
          findings: changed.findings.filter((f) => f.ruleId === rule.id).map((f) => f.message),
        });
      });
    }
    return { ruleId: rule.id, cellsCompared, productsCompared: products.length, changes };
  }

  async listAssignments(productId: number): Promise<AssignmentDto[]> {
    await this.products.getWithRadios(productId);
    const rows = await this.dataSource.getRepository(PartAssignment).find({ where: { productId }, order: { radioId: 'ASC', id: 'ASC' } });
    const parts = await this.partData.getPartData(rows.map((r) => r.partId));
    return rows.map((r) => assignmentDto(r, parts.find((p) => p.id === r.partId)));
  }

  async shortlist(productId: number, radioId: number, partId: number, note: string | undefined, actor: AuthUser): Promise<AssignmentDto[]> {
    await this.checkRadioAndPart(productId, radioId, partId);
    await transactionWithRetry(this.dataSource, async (manager) => {
      const existing = await manager.findOne(PartAssignment, { where: { radioId, partId }, lock: { mode: 'pessimistic_write' } });
      if (existing) return;
      await manager.insert(PartAssignment, { productId, radioId, partId, state: 'shortlisted', note: note ?? null, createdById: actor.id });
      await this.audit.record(manager, { entityType: 'product-assignment', entityId: productId, action: 'shortlisted', userId: actor.id, changes: { radioId, partId } });
    }, ASSIGNMENT_ATTEMPTS, retryAssignmentRace);
    return this.listAssignments(productId);
  }

  async removeFromShortlist(productId: number, radioId: number, partId: number, actor: AuthUser): Promise<AssignmentDto[]> {
    await this.products.assertExists(productId);
    await transactionWithRetry(this.dataSource, async (manager) => {
      const existing = await manager.findOne(PartAssignment, { where: { productId, radioId, partId }, lock: { mode: 'pessimistic_write' } });
      if (!existing) throw new DomainError('ASSIGNMENT_NOT_FOUND', `part ${partId} is not on the shortlist of radio ${radioId}`, 404);
      await manager.delete(PartAssignment, { id: existing.id });
      await this.audit.record(manager, { entityType: 'product-assignment', entityId: productId, action: 'removed', userId: actor.id, changes: { radioId, partId, state: existing.state } });
    }, ASSIGNMENT_ATTEMPTS, retryAssignmentRace);
    return this.listAssignments(productId);
  }

  /** One chosen part per radio: the previous choice goes back to the shortlist, in the same transaction. */
  async choose(productId: number, radioId: number, partId: number, actor: AuthUser): Promise<AssignmentDto[]> {
    await this.checkRadioAndPart(productId, radioId, partId);
    await transactionWithRetry(this.dataSource, async (manager) => {
      const rows = await manager.find(PartAssignment, { where: { radioId }, lock: { mode: 'pessimistic_write' } });
      const previous = rows.find((r) => r.state === 'chosen');
      if (previous?.partId === partId) return;
      if (previous) await manager.update(PartAssignment, { id: previous.id }, { state: 'shortlisted' });
      const existing = rows.find((r) => r.partId === partId);
      if (existing) await manager.update(PartAssignment, { id: existing.id }, { state: 'chosen' });
      else await manager.insert(PartAssignment, { productId, radioId, partId, state: 'chosen', createdById: actor.id });
      await this.audit.record(manager, { entityType: 'product-assignment', entityId: productId, action: 'chosen', userId: actor.id, changes: { radioId, partId: [previous?.partId ?? null, partId] } });
    }, ASSIGNMENT_ATTEMPTS, retryAssignmentRace);
    return this.listAssignments(productId);
  }

  async clearChoice(productId: number, radioId: number, actor: AuthUser): Promise<AssignmentDto[]> {
    await this.products.assertExists(productId);
    await transactionWithRetry(this.dataSource, async (manager) => {
      const chosen = await manager.findOne(PartAssignment, { where: { productId, radioId, state: 'chosen' }, lock: { mode: 'pessimistic_write' } });
      if (!chosen) throw new DomainError('ASSIGNMENT_NOT_FOUND', `radio ${radioId} has no chosen part`, 404);
      await manager.update(PartAssignment, { id: chosen.id }, { state: 'shortlisted' });
      await this.audit.record(manager, { entityType: 'product-assignment', entityId: productId, action: 'unchosen', userId: actor.id, changes: { radioId, partId: chosen.partId } });
    }, ASSIGNMENT_ATTEMPTS, retryAssignmentRace);
    return this.listAssignments(productId);
  }

  async history(productId: number): Promise<{ items: AuditEntryView[]; total: number }> {
    await this.products.getWithRadios(productId);
    return this.audit.list({ entityType: 'product-assignment', entityId: productId, limit: 500 });
  }

  private async checkRadioAndPart(productId: number, radioId: number, partId: number): Promise<void> {
    await this.products.getRadio(productId, radioId);
    const [part] = await this.partData.getPartData([partId]);
    if (!part) throw new NotFoundError('part', partId);
  }
}
