import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import { RevisionCache, type RevisionReader } from '../common/revision-cache';
import { catalogueRevisionReader } from '../parts/catalogue-revision';
import { DomainError } from '../common/domain-error';
import { type PartEvaluationData as CataloguePart, PartDataService } from '../parts/part-data.service';
import type { ProductDetailDto } from '../products/dto/product.dto';
import type { Connector, FormFactor } from '../parts/part.types';
import { RegulatoryLimitsService } from '../regulatory/regulatory-limits.service';
import { type LimitOnFile, limitsFor, marketsUsingBand } from '../regulatory/markets';
import { PartAssignment } from './compatibility.entities';
import { FactsCache } from './engine/matrix';
import type { BandRange, PartEvaluationData, RadioBandRequirement, Technology } from './engine/types';

const MHZ = 1e6;

export interface PartColumn {
  readonly data: PartEvaluationData;
  readonly manufacturer: string;
  readonly formFactor: FormFactor;
  readonly connector: Connector;
}

function toEvaluationData(part: CataloguePart): PartColumn {
  const board = part.evalGroundPlane;
  return {
    manufacturer: part.manufacturer,
    formFactor: part.formFactor,
    connector: part.connector,
    data: {
      partId: part.id,
      mpn: part.mpn,
      title: part.title,
      reflection: part.s11?.curve ?? null,
      efficiencyPercent: part.efficiency?.curve ?? null,
      efficiencyBasis: part.efficiency?.basis ?? 'radiation',
      peakGainDbi: part.peakGain?.curve ?? null,
      gainBasis: part.peakGain?.basis ?? 'peak',
      averageGainDbi: part.averageGain?.curve ?? null,
      specBands: part.specBands.map((b) => ({
        fromHz: b.fromHz,
        toHz: b.toHz,
        maxVswr: b.maxVswr,
        minReturnLossDb: b.minReturnLossDb,
        efficiencyPercent: b.efficiencyPct,
        efficiencyBasis: b.efficiencyBasis,
        efficiencyStatistic: b.efficiencyStatistic,
        peakGainDbi: b.peakGainDbi,
        averageGainDbi: b.averageGainDbi,
        gainBasis: b.gainBasis,
      })),
      evaluationGroundPlane: board && board.lengthMm !== null && board.widthMm !== null ? { lengthMm: board.lengthMm, widthMm: board.widthMm } : null,
      polarization: part.polarization,
      reviewState: part.reviewState,
      lifecycle: part.lifecycle,
    },
  };
}

/** The ranges a radio is judged on: a GNSS radio that needs the main lobe gets the signal's main lobe where the library states one. */
function judgedRanges(radio: ProductDetailDto['radios'][number], band: ProductDetailDto['radios'][number]['bands'][number]['band']): BandRange[] {
  if (radio.technology === 'gnss' && radio.gnssBandwidth !== 'full-band' && band.mainLobe)
    return [{ fromHz: band.mainLobe.fromMhz * MHZ, toHz: band.mainLobe.toMhz * MHZ, role: 'receive' }];
  return band.ranges.map((r) => ({ fromHz: r.fromMhz * MHZ, toHz: r.toMhz * MHZ, role: r.role }));
}

/**
 * The product's radio bands as the engine reads them: each band with the product's markets it is used in and the
 * limits that govern the radio's technology there (see regulatory/markets.ts), and the channels the radio lists.
 */
export function requirementsOf(product: ProductDetailDto, limits: readonly LimitOnFile[]): RadioBandRequirement[] {
  return product.radios.flatMap((radio) =>
    radio.bands.map((rb) => {
      const markets = marketsUsingBand(rb.band.regions, product.targetRegions);
      return {
        radioId: radio.id,
        radioName: radio.name,
        technology: radio.technology as Technology,
        bandId: rb.band.id,
        designation: rb.band.designation,
        ranges: judgedRanges(radio, rb.band),
        txPowerDbm: radio.receiveOnly ? null : radio.transmitPowerDbm,
        certifiedMaxGainDbi: rb.certifiedMaxGainDbi,
        feedLossDb: radio.feedLossDb,
        requiredPolarization: radio.polarization === 'any' ? null : radio.polarization,
        productGroundPlane: { lengthMm: product.groundPlaneLengthMm, widthMm: product.groundPlaneWidthMm },
        regulatoryLimits: limitsFor(radio.technology, markets, limits),
        markets,
        channels: rb.channels ? rb.channels.map((c) => ({ fromHz: c.fromMhz * MHZ, toHz: c.toMhz * MHZ })) : null,
      };
    }),
  );
}

const COLUMN_CACHE_SIZE = 2000;
const FACTS_CACHE_SIZE = 600_000;

/** What the engine evaluates: band requirements of a product, part columns, the approved catalogue, and the facts cache over them. */
@Injectable()
export class EvaluationInputsService {
  // Every cache below holds values of one catalogue revision: the one its caller read before computing.
  /** Facts per (band requirement × part): one FactsCache per catalogue revision. */
  private readonly facts = new RevisionCache<FactsCache>(1);
  /** Evaluation data of parts asked for by id (matrix columns). */
  private readonly columns = new RevisionCache<PartColumn, number>(COLUMN_CACHE_SIZE);
  /** The approved catalogue the candidates are ranked from. */
  private readonly catalogue = new RevisionCache<PartColumn[]>(1);
  private readonly catalogueRevision: RevisionReader;

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly partData: PartDataService,
    private readonly limits: RegulatoryLimitsService,
  ) {
    this.catalogueRevision = catalogueRevisionReader(dataSource);
  }

  /** The catalogue revision now; read it before anything computed from the catalogue. */
  currentRevision(): Promise<number> {
    return this.catalogueRevision.current();
  }

  /** The facts of `revision`; a caller holding an older revision gets a cache of its own that nobody else reads. */
  factsAt(revision: number): FactsCache {
    return this.facts.getOrCreate('facts', revision, () => new FactsCache(FACTS_CACHE_SIZE));
  }

  readonly partKey = (part: PartEvaluationData) => String(part.partId);

  async requirements(product: ProductDetailDto): Promise<RadioBandRequirement[]> {
    return requirementsOf(product, await this.limits.list());
  }

  async assignedPartIds(productId: number): Promise<number[]> {
    const rows = await this.dataSource.getRepository(PartAssignment).find({ where: { productId }, order: { radioId: 'ASC', state: 'DESC', id: 'ASC' } });
    // Chosen parts first (radio order), then the shortlist.
    return [...new Set([...rows.filter((r) => r.state === 'chosen'), ...rows.filter((r) => r.state === 'shortlisted')].map((r) => r.partId))];
  }

  /** The parts' evaluation data, loaded after `revision` was read. */
  async partColumns(ids: number[], revision: number): Promise<PartColumn[]> {
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

  /** The approved catalogue at `revision`, reloaded only when the catalogue revision moved. */
  approvedCatalogue(revision: number): Promise<PartColumn[]> {
    return this.catalogue.getOrLoad('approved', revision, async () => (await this.partData.loadCatalogueForEvaluation(['approved'])).map(toEvaluationData));
  }
}
