import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import { NotFoundError } from '../common/domain-error';
import { ProductsService } from '../products/products.service';
import { PartAssignment } from './compatibility.entities';
import { feedFit, fitRank, polarizationFit } from './engine/fit';
import { rankCandidates } from './engine/matrix';
import type { Polarization } from './engine/types';
import type { CandidatesDto, CandidatesQueryDto } from './dto/matrix.dto';
import { EvaluationInputsService } from './evaluation-inputs.service';
import { findingView, ruleTitlesOf } from './finding-view';
import { RulesService } from './rules.service';
import { OffersReader } from './sourcing/offers-reader.service';
import { bestOffer } from './sourcing/price-at-quantity';

/** As the catalogue search: prices compare in one currency, USD unless asked. */
export const DEFAULT_CURRENCY = 'USD';

/** Approved parts for one radio, ranked by the engine, fitted to the radio's feed and polarization. */
@Injectable()
export class CandidatesService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly rules: RulesService,
    private readonly products: ProductsService,
    private readonly inputs: EvaluationInputsService,
    private readonly offers: OffersReader,
  ) {}

  async candidates(productId: number, radioId: number, query: CandidatesQueryDto = {}): Promise<CandidatesDto> {
    const limit = query.limit ?? 20;
    const quantity = query.quantity ?? 1;
    const currency = query.currency ?? DEFAULT_CURRENCY;
    const product = await this.products.getWithRadios(productId);
    const radio = product.radios.find((r) => r.id === radioId);
    if (!radio) throw new NotFoundError('radio', radioId);
    const requirements = (await this.inputs.requirements(product)).filter((r) => r.radioId === radioId);
    const revision = await this.inputs.currentRevision();
    const catalogue = await this.inputs.approvedCatalogue(revision);
    const offers = await this.offers.allAt(revision);
    const limits = { maxUnitPrice: query.maxPrice, maxLeadTimeDays: query.maxLeadTimeDays };
    const filtering = query.maxPrice !== undefined || query.maxLeadTimeDays !== undefined;
    const prices = new Map(catalogue.map((c) => [c.data.partId, bestOffer(offers.get(c.data.partId) ?? [], quantity, currency, limits)]));
    const eligible = catalogue.filter(
      (c) =>
        (!query.formFactor || query.formFactor.includes(c.formFactor)) &&
        (!query.feed || query.feed.includes(c.connector)) &&
        (!filtering || prices.get(c.data.partId) !== null),
    );
    const required = radio.polarization === 'any' ? null : (radio.polarization as Polarization);
    const columns = new Map(eligible.map((c) => [c.data.partId, c]));
    const fitOf = (partId: number) => {
      const column = columns.get(partId)!;
      const feed = feedFit(radio.connector, column.connector);
      const polarization = polarizationFit(required, column.data.polarization);
      return { feed, polarization, rank: fitRank(feed, polarization) };
    };
    const { compiled } = await this.rules.currentRuleSet();
    const ranked = rankCandidates(
      requirements,
      eligible.map((c) => c.data),
      compiled,
      { cache: this.inputs.factsAt(revision), partKey: this.inputs.partKey, limit, fitRank: (part) => fitOf(part.partId).rank },
    );
    const titles = ruleTitlesOf(compiled);
    const assignments = await this.dataSource.getRepository(PartAssignment).find({ where: { radioId } });
    return {
      productId,
      radioId,
      radioName: radio.name,
      radioConnector: radio.connector,
      quantity,
      currency,
      evaluated: eligible.length,
      candidates: ranked.map((c) => {
        const column = columns.get(c.partId)!;
        const explanation = c.explanation;
        return {
          partId: c.partId,
          mpn: c.mpn,
          title: c.title,
          manufacturer: column.manufacturer,
          formFactor: column.formFactor,
          connector: column.connector,
          status: c.status,
          fit: fitOf(c.partId),
          explanation: { ...explanation, finding: explanation.finding ? findingView(explanation.finding, titles) : null },
          marginDb: c.marginDb,
          deciding: c.deciding,
          price: prices.get(c.partId) ?? null,
          assignment: assignments.find((a) => a.partId === c.partId)?.state ?? null,
          bands: c.bands.map((b) => ({
            bandId: b.bandId,
            designation: b.designation,
            status: b.status,
            findings: b.findings.map((f) => findingView(f, titles)),
            decidingFinding: b.decidingFinding ? findingView(b.decidingFinding, titles) : null,
          })),
        };
      }),
    };
  }
}
