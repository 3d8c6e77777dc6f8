export interface RuleSummary {
  id: string;
  title: string;
  description: string;
  severity: 'fail' | 'marginal' | 'info';
  enabled: boolean;
  version: number;
  source: string;
  origin: 'file' | 'file-edited' | 'admin';
  updatedAt: string | null;
}

export interface RuleDetail extends RuleSummary {
  definition: Record<string, unknown>;
}

export interface RuleProblem {
  path: string;
  message: string;
}

export interface RuleVersion {
  version: number;
  action: string;
  changedBy: string | null;
  at: string | null;
}

export interface CellChange {
  productId: number;
  productName: string;
  radioName: string;
  designation: string;
  mpn: string;
  before: string;
  after: string;
  findings: string[];
}

export interface RulePreview {
  ruleId: string;
  cellsCompared: number;
  productsCompared: number;
  changes: CellChange[];
}
