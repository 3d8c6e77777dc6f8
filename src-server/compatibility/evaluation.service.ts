import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import { dbToPowerRatio } from '../rf/units';
import { ProductsService } from '../products/products.service';
import { PartAssignment } from './compatibility.entities';
import { roundFactValue } from './engine/compute-facts';
import { findingTitle } from './engine/deciding';
import { evaluateProduct, type BandEvaluation, type RadioEvaluation } from './engine/product-evaluation';
import type { Facts, Finding } from './engine/types';
import type { BandFactsDto, EvaluationRadioDto, ProductEvaluationDto } from './dto/evaluation.dto';
import { EvaluationInputsService } from './evaluation-inputs.service';
import { findingView, ruleTitlesOf } from './finding-view';
import { RulesService } from './rules.service';
import { loadCoexistenceRule } from './coexistence-rule-file';
import { type CoexistenceFinding, type IsolationLookup, checkCoexistence } from './engine/coexistence-check';
import type { CellStatus } from './engine/types';
import { statusRank } from './engine/rule-binding';

/** The product verdict with coexistence counted in: a fail or marginal finding can only make it worse; notes do not count. */
function withCoexistence(verdict: CellStatus, coexistence: readonly CoexistenceFinding[]): { verdict: CellStatus; deciding: CoexistenceFinding | null } {
  let worst = verdict;
  let deciding: CoexistenceFinding | null = null;
  for (const finding of coexistence) {
    if (finding.severity === 'info') continue;
    if (statusRank(finding.severity) > statusRank(worst)) {
      worst = finding.severity;
      deciding = finding;
    }
  }
  return { verdict: worst, deciding };
}

import { InProductMeasurementsService, type MeasuredReflection, antennaKey } from '../products/in-product/in-product-measurements.service';
import type { PartEvaluationData } from './engine/types';
import type { AntennaRole } from '../products/in-product/antenna-roles';

/** Says on every band of a radio that its S11 came from the product, not the evaluation board. */
function inProductS11Finding(measured: MeasuredReflection, mpn: string): Finding {
  return {
    ruleId: 'evaluation',
    severity: 'info',
    code: 'S11_MEASURED_IN_PRODUCT',
    message: `S11 ${measured.source} replaces the evaluation-board S11 of ${mpn}`,
  };
}

/** The VSWR the band-coverage rule judges coverage at (rules/band-coverage.json). */
const COVERAGE_VSWR = 3;

const numberOrNull = (value: unknown): number | null => (typeof value === 'number' && Number.isFinite(value) ? value : null);

/**
 * The band's facts as the evaluation shows them. System efficiency is the engine's fact when it computes one;
 * otherwise it is worked out here from total efficiency and the feed loss: η_sys = η_tot × 10^(−L/10).
 */
export function bandFacts(facts: Facts | null, feedLossDb: number): BandFactsDto {
  const coverage = numberOrNull(facts?.coverageAtVswr3Pct);
  const minTotal = numberOrNull(facts?.minTotalEfficiencyPct);
  const system = numberOrNull(facts?.minSystemEfficiencyPct) ?? (minTotal === null ? null : roundFactValue(minTotal * dbToPowerRatio(-feedLossDb)));
  return {
    coverageFraction: coverage === null ? null : roundFactValue(coverage / 100),
    coverageVswr: COVERAGE_VSWR,
    worstVswr: numberOrNull(facts?.worstVswr),
    minTotalEfficiencyPct: minTotal,
    avgTotalEfficiencyPct: numberOrNull(facts?.avgTotalEfficiencyPct),
    minSystemEfficiencyPct: system,
    feedLossDb,
    peakGainDbi: numberOrNull(facts?.peakGainDbi),
    eirpDbm: numberOrNull(facts?.eirpDbm),
    detuningMarginDownPct: numberOrNull(facts?.detuningMarginDownPct),
    detuningMarginUpPct: numberOrNull(facts?.detuningMarginUpPct),
  };
}

/** "Band not covered on B3: VSWR ≤ 3:1 covers only 0 % of B3 …", or the pass in words. */
function reasonOf(radio: RadioEvaluation, titles: ReadonlyMap<string, string>): string {
  if (radio.status === 'pass') return `every band passes with ${radio.chosen.map((p) => p.mpn).join(' and ')}`;
  const finding = radio.decidingFinding;
  if (!finding) return 'not checked';
  const band = radio.bands.find((b) => b.requirement.bandId === radio.decidingBandId);
  const title = findingTitle(finding.code, titles.get(finding.ruleId));
  return band ? `${title} on ${band.requirement.designation}: ${finding.message}` : `${title}: ${finding.message}`;
}

/** One answer per radio and for the product: each radio's bands against the part chosen for it. */
@Injectable()
export class EvaluationService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly rules: RulesService,
    private readonly products: ProductsService,
    private readonly inputs: EvaluationInputsService,
    private readonly inProduct: InProductMeasurementsService,
  ) {}

  /** In-product antenna isolation between two radios of the product, dB, where it is measured; unknown elsewhere. */
  async isolationLookup(productId: number): Promise<IsolationLookup> {
    return this.inProduct.radioIsolation(productId);
  }

  /** The coexistence findings of a product (harmonics, intermodulation and transmit edges on other radios' receive ranges), with its names. */
  async coexistence(productId: number): Promise<{ productName: string; radioNames: Map<number, string>; findings: CoexistenceFinding[] }> {
    const product = await this.products.getWithRadios(productId);
    const findings = await this.coexistenceOf(product, await this.inputs.requirements(product));
    return { productName: product.name, radioNames: new Map(product.radios.map((r) => [r.id, r.name])), findings };
  }

  private async coexistenceOf(
    product: Awaited<ReturnType<ProductsService['getWithRadios']>>,
    requirements: Awaited<ReturnType<EvaluationInputsService['requirements']>>,
  ): Promise<CoexistenceFinding[]> {
    // A receiver's front end passes the whole signal band, not only the main lobe a GNSS match is judged on.
    const fullBands = new Map(product.radios.flatMap((radio) => radio.bands.map((rb) => [`${radio.id}:${rb.band.id}`, rb.band.ranges] as const)));
    const asReceiversSeeThem = requirements.map((requirement) => {
      const ranges = fullBands.get(`${requirement.radioId}:${requirement.bandId}`);
      return ranges ? { ...requirement, ranges: ranges.map((r) => ({ fromHz: r.fromMhz * 1e6, toHz: r.toMhz * 1e6, role: r.role })) } : requirement;
    });
    return checkCoexistence(asReceiversSeeThem, loadCoexistenceRule(), {
      simultaneousTransmit: product.simultaneousTransmit === 'all' ? null : product.simultaneousTransmit,
      isolation: await this.isolationLookup(product.id),
    });
  }

  async evaluate(productId: number): Promise<ProductEvaluationDto> {
    const product = await this.products.getWithRadios(productId);
    const ruleSet = await this.rules.currentRuleSet();
    const revision = await this.inputs.currentRevision();
    const chosen = await this.dataSource.getRepository(PartAssignment).find({ where: { productId, state: 'chosen' }, order: { radioId: 'ASC', id: 'ASC' } });
    const columns = await this.inputs.partColumns([...new Set(chosen.map((a) => a.partId))], revision);
    const byPart = new Map(columns.map((c) => [c.data.partId, c]));
    const requirements = await this.inputs.requirements(product);
    // An antenna's S11 measured in the product replaces its evaluation-board S11; such parts skip the facts cache.
    const measured = await this.inProduct.measuredReflections(productId);
    const correlation = await this.inProduct.correlationFindings(productId);
    const usedInProduct = new Map<PartEvaluationData, MeasuredReflection>();
    // Each chosen part is its own object so that its antenna role can be told apart (a part can serve two roles).
    const roleOf = new Map<PartEvaluationData, AntennaRole>();
    const dataFor = (a: PartAssignment): PartEvaluationData => {
      const data = byPart.get(a.partId)!.data;
      const inProduct = measured.get(antennaKey(a.radioId, a.role));
      const copy = inProduct ? { ...data, reflection: inProduct.curve } : { ...data };
      if (inProduct) usedInProduct.set(copy, inProduct);
      roleOf.set(copy, a.role);
      return copy;
    };
    const evaluation = evaluateProduct(
      product.radios.map((radio) => ({
        radioId: radio.id,
        radioName: radio.name,
        requirements: requirements.filter((r) => r.radioId === radio.id),
        chosen: chosen.filter((a) => a.radioId === radio.id).map(dataFor),
        systemFindings: correlation.get(radio.id),
      })),
      ruleSet.compiled,
      { cache: this.inputs.factsAt(revision), partKey: (part) => (usedInProduct.has(part) ? null : this.inputs.partKey(part)) },
    );
    const titles = ruleTitlesOf(ruleSet.compiled);
    const view = (f: Finding | null) => (f ? findingView(f, titles) : null);
    const radios = evaluation.radios.map((r): EvaluationRadioDto => {
      const radio = product.radios.find((x) => x.id === r.radioId)!;
      return {
        radioId: r.radioId,
        name: r.radioName,
        technology: radio.technology,
        verdict: r.status,
        decidingFinding: view(r.decidingFinding),
        decidingBandId: r.decidingBandId,
        reason: reasonOf(r, titles),
        chosen: r.chosen.map((p) => ({
          partId: p.partId,
          mpn: p.mpn,
          title: p.title,
          manufacturer: byPart.get(p.partId)?.manufacturer ?? '',
          role: roleOf.get(p) ?? 'main',
          s11Source: usedInProduct.get(p)?.source ?? 'evaluation board',
        })),
        bands: r.bands.map((b: BandEvaluation) => ({
          bandId: b.requirement.bandId,
          designation: b.requirement.designation,
          verdict: b.status,
          decidingFinding: view(b.decidingFinding),
          partId: b.partId,
          findings: [...b.findings, ...r.chosen.flatMap((p) => (usedInProduct.has(p) ? [inProductS11Finding(usedInProduct.get(p)!, p.mpn)] : []))].map((f) =>
            findingView(f, titles),
          ),
          facts: bandFacts(b.facts, radio.feedLossDb),
        })),
      };
    });
    // The product's reason is its worst radio's (the first of them, in the product's order).
    const deciding = radios.find((r) => r.verdict === evaluation.status) ?? null;
    const productFinding = evaluation.findings.find((f) => f.radioId === null)?.finding ?? null;
    const coexistence = await this.coexistenceOf(product, requirements);
    const overall = withCoexistence(evaluation.status, coexistence);
    return {
      productId,
      productName: product.name,
      verdict: overall.verdict,
      reason: overall.deciding
        ? `Coexistence: ${overall.deciding.message}`
        : deciding
          ? `${deciding.name}: ${deciding.reason}`
          : productFinding
            ? productFinding.message
            : 'every radio passes',
      radios,
      findings: evaluation.findings.map((f) => ({ ...findingView(f.finding, titles), radioId: f.radioId })),
      coexistence,
      rules: ruleSet.signature,
      evaluatedAt: new Date().toISOString(),
    };
  }
}
