import type { components } from '../../lib/api-types';

type Schemas = components['schemas'];
export type Technology = Schemas['Technology'];
export type RangeRole = Schemas['RangeRole'];

export type Band = Schemas['BandDto'];

export interface BandFilter {
  technology?: Technology;
  fromMhz?: number;
  toMhz?: number;
}

export type BandSet = Schemas['BandSetDto'];

export interface BandSetInput {
  name: string;
  description: string;
  bandIds: number[];
}

export type LimitKind = Schemas['LimitKind'];

export type RegulatoryLimit = Schemas['RegulatoryLimitDto'];

export type RegulatoryLimitInput = Omit<RegulatoryLimit, 'id' | 'updatedAt'>;

export const TECHNOLOGY_LABELS: Record<Technology, string> = {
  lte: 'LTE (incl. LTE-M, NB-IoT)',
  nr: '5G NR',
  gnss: 'GNSS',
  wifi: 'Wi-Fi',
  ble: 'Bluetooth LE',
  ism: 'Sub-GHz ISM / LoRaWAN',
  uwb: 'UWB',
  other: 'Other',
};

/** The markets offered in forms: global, the groupings (EU, CEPT, ASIA) and common ISO 3166-1 country codes; the server takes any ISO code. */
export const REGIONS = ['global', 'EU', 'CEPT', 'ASIA', 'GB', 'US', 'CA', 'MX', 'BR', 'AU', 'NZ', 'JP', 'KR', 'CN', 'IN'] as const;

export const LIMIT_KIND_LABELS: Record<LimitKind, string> = {
  eirp: 'EIRP',
  erp: 'ERP',
  conducted: 'Conducted power at the radio port',
  'conducted-gain-rule': 'Conducted power with antenna-gain rule',
};
