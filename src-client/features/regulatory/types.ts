import type { components } from '../../lib/api-types';
import type { AsTyped } from '../../lib/form-input';

type Schemas = components['schemas'];
export type Region = Schemas['Region'];
export type LimitKind = Schemas['LimitKind'];

export type RegulatoryLimit = Schemas['RegulatoryLimitDto'];

export type RegulatoryLimitInput = AsTyped<Schemas['CreateRegulatoryLimitDto']>;

export type RegulatoryLimitUpdate = AsTyped<Schemas['UpdateRegulatoryLimitDto']>;

/** The markets offered in forms: global, the groupings (EU, CEPT, ASIA) and common ISO 3166-1 country codes; the server takes any ISO code. */
export const REGIONS = ['global', 'EU', 'CEPT', 'ASIA', 'GB', 'US', 'CA', 'MX', 'BR', 'AU', 'NZ', 'JP', 'KR', 'CN', 'IN'] as const satisfies readonly Region[];

export const LIMIT_KIND_LABELS: Record<LimitKind, string> = {
  eirp: 'EIRP',
  erp: 'ERP',
  conducted: 'Conducted power at the radio port',
  'conducted-gain-rule': 'Conducted power with antenna-gain rule',
};

export type Technology = Schemas['Technology'];
export { TECHNOLOGY_LABELS } from '../../lib/technology-labels';
