import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import { RevisionCache } from '../common/revision-cache';
import { NotFoundError } from '../common/domain-error';
import { ProductsService } from '../products/products.service';
import { PartAssignment } from './compatibility.entities';
import type { RuleDefinition } from './engine/rule-definition';
import type { CompiledRuleSet } from './engine/compiled-evaluator';
import { evaluateMatrix } from './engine/matrix';
import type { MatrixColumnDto, MatrixDto } from './dto/matrix.dto';
import { EvaluationInputsService } from './evaluation-inputs.service';
import { marketFindings } from '../regulatory/markets';
import { RulesService } from './rules.service';

const MATRIX_CACHE_SIZE = 200;

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
  async matrix(productId: number, partIds?: number[], rules?: RuleDefinition[]): Promise<MatrixDto> {
    if (rules) return this.computeMatrix(productId, partIds, { compiled: this.rules.compile(rules), signature: '' }, await this.inputs.currentRevision());
    const ruleSet = await this.rules.currentRuleSet();
    const { fingerprint, revision } = await this.matrixFingerprint(productId);
    const key = `${productId}|${partIds?.join(',') ?? '*'}|${ruleSet.signature}|${fingerprint}`;
    return this.matrices.getOrLoad(key, revision, () => this.computeMatrix(productId, partIds, ruleSet, revision));
  }

  /** Everything read here is read after `revision` was, so the matrix is at least that new. */
  private async computeMatrix(
    productId: number,
    partIds: number[] | undefined,
    ruleSet: { compiled: CompiledRuleSet; signature: string },
    revision: number,
  ): Promise<MatrixDto> {
    const product = await this.products.getWithRadios(productId);
    const ids = partIds ?? (await this.inputs.assignedPartIds(productId));
    const columns = await this.inputs.partColumns(ids, revision);
    const requirements = await this.inputs.requirements(product);
    const matrix = evaluateMatrix(
      requirements,
      columns.map((c) => c.data),
      ruleSet.compiled,
      { cache: this.inputs.factsAt(revision), partKey: this.inputs.partKey },
    );
    const assignments = await this.dataSource.getRepository(PartAssignment).find({ where: { productId } });
    const markets = marketFindings(product.targetRegions, product.radios);
    const rowFindings = (r: { radioId: number; bandId: number }) =>
      markets.rows.find((m) => m.radioId === r.radioId && m.bandId === r.bandId)?.findings.map((f) => ({ ...f })) ?? [];
    return {
      productId,
      productName: product.name,
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
      cells: matrix.cells.map((c) => ({ ...c, findings: [...c.findings] })),
      radios: markets.radios.map((r) => ({ radioId: r.radioId, findings: r.findings.map((f) => ({ ...f })) })),
      rules: ruleSet.signature,
    };
  }
}
