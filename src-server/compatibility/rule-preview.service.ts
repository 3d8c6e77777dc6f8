import { Injectable } from '@nestjs/common';
import { ProductsService } from '../products/products.service';
import type { CellChangeDto, RulePreviewDto } from './dto/rule.dto';
import { EvaluationInputsService } from './evaluation-inputs.service';
import { MatrixService } from './matrix.service';
import { RulesService } from './rules.service';

/** What a rule edit would change before it is saved. */
@Injectable()
export class RulePreviewService {
  constructor(
    private readonly rules: RulesService,
    private readonly products: ProductsService,
    private readonly inputs: EvaluationInputsService,
    private readonly matrices: MatrixService,
  ) {}

  /** Which cells of which products change when `rule` replaces (or joins) the current rules. */
  async previewRule(definition: unknown): Promise<RulePreviewDto> {
    const rule = this.rules.checked(definition);
    const before = (await this.rules.effectiveRules()).map((e) => e.rule);
    const after = before.some((r) => r.id === rule.id) ? before.map((r) => (r.id === rule.id ? rule : r)) : [...before, rule];
    const products = await this.products.list();
    const changes: CellChangeDto[] = [];
    let cellsCompared = 0;
    for (const summary of products) {
      const ids = await this.inputs.assignedPartIds(summary.id);
      if (ids.length === 0) continue;
      // The matrices as engineers see them: each radio against its own parts.
      const [old, next] = [await this.matrices.matrix(summary.id, {}, before), await this.matrices.matrix(summary.id, {}, after)];
      cellsCompared += old.cells.length;
      old.cells.forEach((cell, i) => {
        const changed = next.cells[i];
        if (cell.status === changed.status) return;
        const row = old.rows[cell.row];
        const column = old.columns[cell.column];
        changes.push({
          productId: summary.id,
          productName: summary.name,
          radioId: row.radioId,
          radioName: row.radioName,
          bandId: row.bandId,
          designation: row.designation,
          partId: column.partId,
          mpn: column.mpn,
          before: cell.status,
          after: changed.status,
          findings: changed.findings.filter((f) => f.ruleId === rule.id).map((f) => f.message),
        });
      });
    }
    return { ruleId: rule.id, cellsCompared, productsCompared: products.length, changes };
  }
}
