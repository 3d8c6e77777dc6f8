import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import { NotFoundError } from '../common/domain-error';
import { ProductsService } from '../products/products.service';
import { PartAssignment } from './compatibility.entities';
import { rankCandidates } from './engine/matrix';
import type { CandidatesDto } from './dto/matrix.dto';
import { EvaluationInputsService } from './evaluation-inputs.service';
import { RulesService } from './rules.service';

/** Approved parts for one radio, ranked by the engine. */
@Injectable()
export class CandidatesService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly rules: RulesService,
    private readonly products: ProductsService,
    private readonly inputs: EvaluationInputsService,
  ) {}

  async candidates(productId: number, radioId: number, limit = 20): Promise<CandidatesDto> {
    const product = await this.products.getWithRadios(productId);
    const radio = product.radios.find((r) => r.id === radioId);
    if (!radio) throw new NotFoundError('radio', radioId);
    const requirements = (await this.inputs.requirements(product)).filter((r) => r.radioId === radioId);
    const revision = await this.inputs.currentRevision();
    const catalogue = await this.inputs.approvedCatalogue(revision);
    const { compiled } = await this.rules.currentRuleSet();
    const ranked = rankCandidates(
      requirements,
      catalogue.map((c) => c.data),
      compiled,
      { cache: this.inputs.factsAt(revision), partKey: this.inputs.partKey, limit },
    );
    const manufacturers = new Map(catalogue.map((c) => [c.data.partId, c.manufacturer]));
    const assignments = await this.dataSource.getRepository(PartAssignment).find({ where: { radioId } });
    return {
      productId,
      radioId,
      radioName: radio.name,
      evaluated: catalogue.length,
      candidates: ranked.map((c) => ({
        partId: c.partId,
        mpn: c.mpn,
        title: c.title,
        manufacturer: manufacturers.get(c.partId) ?? '',
        status: c.status,
        marginDb: c.marginDb,
        deciding: c.deciding,
        assignment: assignments.find((a) => a.partId === c.partId)?.state ?? null,
        bands: c.bands.map((b) => ({ ...b, findings: [...b.findings] })),
      })),
    };
  }
}
