import type { components } from '../../lib/api-types';
import type { AsTyped } from '../../lib/form-input';

type Schemas = components['schemas'];
export type Region = Schemas['Region'];
export type LimitKind = Schemas['LimitKind'];

export type RegulatoryLimit = Schemas['RegulatoryLimitDto'];

export type RegulatoryLimitInput = AsTyped<Schemas['CreateRegulatoryLimitDto']>;

export type RegulatoryLimitUpdate = AsTyped<Schemas['UpdateRegulatoryLimitDto']>;

export const REGIONS = ['global', 'EU', 'UK', 'US', 'CA', 'MX', 'BR', 'AU', 'NZ', 'JP', 'KR', 'CN', 'IN', 'AS'] as const satisfies readonly Region[];

export const LIMIT_KIND_LABELS: Record<LimitKind, string> = {
  eirp: 'EIRP',
  erp: 'ERP',
  'conducted-gain-rule': 'Conducted power with antenna-gain rule',
};
