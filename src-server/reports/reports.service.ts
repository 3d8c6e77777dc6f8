import { Injectable } from '@nestjs/common';
import type { AuthUser } from '../common/auth.decorators';
import { EvaluationService } from '../compatibility/evaluation.service';
import { MATRIX_CSV_CAUTION } from '../compatibility/matrix-csv';
import { RulesService } from '../compatibility/rules.service';
import { ProductsService } from '../products/products.service';
import { renderProductReport } from './product-report';
import { loadCoexistenceRule } from '../compatibility/coexistence-rule-file';
import { loadEnvelopeCorrelationRule } from '../products/in-product/envelope-correlation-rule';

/** The cautions every report carries, beside the screening caution that travels with every figure. */
const REPORT_CAUTIONS = [
  MATRIX_CSV_CAUTION,
  'Regulatory limits and certified antenna gains are screened as entered in Bandwright; the module grant, the local regulator and an accredited test lab decide. A band marked "Not checked" has no limit or data on file and is not a pass.',
  'RF exposure (SAR / MPE) is not assessed here. Follow the local codes and licensed practice for the device and its use near people and animals.',
];

/** A file name a download can carry: the product code, the date, nothing a header could trip on. */
export function reportFileName(code: string, generatedAt: Date): string {
  const safeCode =
    code
      .replace(/[^a-z0-9-]/gi, '-')
      .split('-')
      .filter(Boolean)
      .join('-') || 'product';
  return `bandwright-report-${safeCode}-${generatedAt.toISOString().slice(0, 10)}.pdf`;
}

@Injectable()
export class ReportsService {
  constructor(
    private readonly evaluations: EvaluationService,
    private readonly products: ProductsService,
    private readonly rules: RulesService,
  ) {}

  /** The product's report as a PDF: the evaluation at this moment, the rules in force, the cautions and a sign-off block. */
  async productReport(productId: number, actor: AuthUser): Promise<{ body: Buffer; fileName: string; contentType: string }> {
    // The product first: an unknown id answers 404 before anything is computed.
    const product = await this.products.getWithRadios(productId);
    const [evaluation, rules] = await Promise.all([this.evaluations.evaluate(productId), this.rules.list()]);
    const generatedAt = new Date();
    const body = await renderProductReport({
      generatedAt,
      generatedBy: `${actor.name} (${actor.email})`,
      product: {
        id: product.id,
        name: product.name,
        code: product.code,
        version: product.version,
        targetRegions: product.targetRegions,
        groundPlaneMm: { length: product.groundPlaneLengthMm, width: product.groundPlaneWidthMm },
      },
      evaluation,
      rules: [
        ...rules.filter((rule) => rule.enabled).map((rule) => ({ id: rule.id, name: rule.title, version: rule.version, severity: rule.severity })),
        ...[loadCoexistenceRule(), loadEnvelopeCorrelationRule()].map((rule) => ({
          id: rule.id,
          name: rule.title,
          version: rule.version,
          severity: 'by outcome',
        })),
      ],
      coexistenceAssumptions: `${loadCoexistenceRule().description} Sources: ${loadCoexistenceRule().source}`,
      cautions: REPORT_CAUTIONS,
    });
    return { body, fileName: reportFileName(product.code, generatedAt), contentType: 'application/pdf' };
  }
}
