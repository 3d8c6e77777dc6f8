import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import { RevisionCache } from '../common/revision-cache';
import { NotFoundError, ValidationFailedError } from '../common/domain-error';
import { ProductsService } from '../products/products.service';
import { PartAssignment } from './compatibility.entities';
import type { RuleDefinition } from './engine/rule-definition';
import type { CompiledRuleSet } from './engine/compiled-evaluator';
import { evaluateMatrix } from './engine/matrix';
import { decidingFindingOf } from './engine/deciding';
import type { MatrixColumnDto, MatrixDto, MatrixView } from './dto/matrix.dto';
import { findingView, ruleTitlesOf } from './finding-view';
import { EvaluationInputsService } from './evaluation-inputs.service';
import { marketFindings } from '../regulatory/markets';
import { RulesService } from './rules.service';

const MATRIX_CACHE_SIZE = 200;

/** Which parts a matrix shows: the asked ones on every row, or each radio's own assigned (or chosen) parts on its rows. */
export interface MatrixSelection {
  readonly partIds?: readonly number[];
  readonly chosenOnly?: boolean;
}

function viewOf(selection: MatrixSelection): MatrixView {
  if (selection.partIds) {
    if (selection.chosenOnly) throw new ValidationFailedError([{ field: 'chosenOnly', message: 'cannot be combined with parts' }]);
    return 'parts';
  }
  return selection.chosenOnly ? 'chosen' : 'assigned';
}

/** The compatibility matrix of a product: its radio bands against parts under the rules. */
@Injectable()
export class MatrixService {
  /** Matrices by product, asked parts, rule signature and the fingerprint of everything else they read (values of one catalogue revision). */
  private readonly matrices = new RevisionCache<MatrixDto>(MATRIX_CACHE_SIZE);

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly rules: RulesService,
    private readonly products: ProductsService,
    private readonly inputs: EvaluationInputsService,
  ) {}

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
         (SELECT CONCAT(COUNT(*), '/', COALESCE(SUM(CRC32(CONCAT_WS(',', rb.radio_id, rb.band_id, COALESCE(rb.certified_max_gain_dbi, 'n'), rb.position, COALESCE(rb.channels, 'n')))), 0))
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
  async matrix(productId: number, selection: MatrixSelection = {}, rules?: RuleDefinition[]): Promise<MatrixDto> {
    const view = viewOf(selection);
    const partIds = selection.partIds ? [...selection.partIds] : undefined;
    if (rules) return this.computeMatrix(productId, view, partIds, { compiled: this.rules.compile(rules), signature: '' }, await this.inputs.currentRevision());
    const ruleSet = await this.rules.currentRuleSet();
    const { fingerprint, revision } = await this.matrixFingerprint(productId);
    const key = `${productId}|${view}|${partIds?.join(',') ?? '*'}|${ruleSet.signature}|${fingerprint}`;
    return this.matrices.getOrLoad(key, revision, () => this.computeMatrix(productId, view, partIds, ruleSet, revision));
  }

  /** Everything read here is read after `revision` was, so the matrix is at least that new. */
  private async computeMatrix(
    productId: number,
    view: MatrixView,
    partIds: number[] | undefined,
    ruleSet: { compiled: CompiledRuleSet; signature: string },
    revision: number,
  ): Promise<MatrixDto> {
    const product = await this.products.getWithRadios(productId);
    const assignments = await this.dataSource.getRepository(PartAssignment).find({ where: { productId } });
    const shown = view === 'chosen' ? assignments.filter((a) => a.state === 'chosen') : assignments;
    const ids = partIds ?? (await this.inputs.assignedPartIds(productId)).filter((id) => shown.some((a) => a.partId === id));
    const columns = await this.inputs.partColumns(ids, revision);
    const requirements = await this.inputs.requirements(product);
    // A radio's rows are judged against that radio's own parts only: a BLE chip is no answer for an LTE band.
    const columnsFor =
      view === 'parts'
        ? undefined
        : (row: { radioId: number }) =>
            columns.flatMap((c, index) => (shown.some((a) => a.radioId === row.radioId && a.partId === c.data.partId) ? [index] : []));
    const matrix = evaluateMatrix(
      requirements,
      columns.map((c) => c.data),
      ruleSet.compiled,
      { cache: this.inputs.factsAt(revision), partKey: this.inputs.partKey, columnsFor },
    );
    const titles = ruleTitlesOf(ruleSet.compiled);
    const markets = marketFindings(product.targetRegions, product.radios);
    const rowFindings = (r: { radioId: number; bandId: number }) =>
      markets.rows.find((m) => m.radioId === r.radioId && m.bandId === r.bandId)?.findings.map((f) => findingView(f, titles)) ?? [];
    return {
      productId,
      productName: product.name,
      view,
      rows: matrix.rows.map((r) => ({ ...r, ranges: r.ranges.map((x) => ({ ...x })), findings: rowFindings(r) })),
      columns: columns.map((c): MatrixColumnDto => ({
        partId: c.data.partId,
        mpn: c.data.mpn,
        title: c.data.title,
        manufacturer: c.manufacturer,
        reviewState: c.data.reviewState,
        lifecycle: c.data.lifecycle,
        assignments: assignments.filter((a) => a.partId === c.data.partId).map((a) => ({ radioId: a.radioId, state: a.state })),
      })),
      cells: matrix.cells.map((c) => {
        const deciding = decidingFindingOf(c.status, c.findings);
        return {
          row: c.row,
          column: c.column,
          status: c.status,
          findings: c.findings.map((f) => findingView(f, titles)),
          decidingFinding: deciding ? findingView(deciding, titles) : null,
        };
      }),
      radios: markets.radios.map((r) => ({ radioId: r.radioId, findings: r.findings.map((f) => findingView(f, titles)) })),
      rules: ruleSet.signature,
    };
  }
}
