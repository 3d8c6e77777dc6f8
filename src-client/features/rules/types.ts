import type { components } from '../../lib/api-types';

type Schemas = components['schemas'];
export type Severity = Schemas['Severity'];

export type RuleSummary = Schemas['RuleSummaryDto'];

export type RuleDetail = Schemas['RuleDetailDto'];

export type RuleProblem = Schemas['RuleProblemDto'];

export type RuleValidation = Schemas['RuleValidationDto'];

export type RuleVersion = Schemas['RuleVersionDto'];

export type CellChange = Schemas['CellChangeDto'];

export type RulePreview = Schemas['RulePreviewDto'];
