import type { components } from '../../lib/api-types';

type Schemas = components['schemas'];
export type Technology = Schemas['Technology'];
export type RangeRole = Schemas['RangeRole'];
export type Polarization = Schemas['RadioPolarization'];
export type Connector = Schemas['Connector'];

/** The band as the products feature needs it (its own copy: features do not import each other). */
export interface BandChoice {
  id: number;
  technology: Technology;
  designation: string;
  name: string;
  ranges: { role: RangeRole; fromMhz: number; toMhz: number }[];
  duplex: string;
}

export interface BandSetChoice {
  id: number;
  name: string;
  description: string;
  bandIds: number[];
  bands: { id: number; technology: Technology; designation: string }[];
}

export type ProductSummary = Schemas['ProductSummaryDto'];

export type Radio = Schemas['RadioDto'];

export type ProductDetail = Schemas['ProductDetailDto'];

export interface ProductInput {
  name: string;
  code: string;
  owner: string;
  groundPlaneLengthMm: number | string;
  groundPlaneWidthMm: number | string;
  targetRegions: string[];
  notes: string | null;
}

export interface RadioInput {
  name: string;
  technology: Technology;
  module: string;
  transmitPowerDbm: number | string | null;
  polarization: Polarization;
  connector: Connector;
  feedLossDb: number | string;
  notes: string | null;
  bands: { bandId: number; certifiedMaxGainDbi: number | string | null }[];
}

export interface HistoryEntry {
  id: string;
  action: string;
  user: { id: number; name: string } | null;
  changes: Record<string, unknown>;
  at: string;
}

export const TECHNOLOGY_LABELS: Record<Technology, string> = {
  lte: 'LTE (LTE-M, NB-IoT, Cat-1)',
  nr: '5G NR',
  gnss: 'GNSS (receive only)',
  wifi: 'Wi-Fi',
  ble: 'Bluetooth LE',
  ism: 'Sub-GHz ISM / LoRa',
  uwb: 'UWB',
  other: 'Other',
};
/** Short words for lists where the full label would crowd the cell. */
export const TECHNOLOGY_SHORT_LABELS: Record<Technology, string> = {
  lte: 'LTE',
  nr: '5G NR',
  gnss: 'GNSS',
  wifi: 'Wi-Fi',
  ble: 'Bluetooth LE',
  ism: 'Sub-GHz ISM',
  uwb: 'UWB',
  other: 'Other',
};
export const RECEIVE_ONLY: Technology[] = ['gnss'];
/** The markets offered in forms: global, the groupings (EU, CEPT, ASIA) and common ISO 3166-1 country codes; the server takes any ISO code. */
export const REGIONS = ['global', 'EU', 'CEPT', 'ASIA', 'GB', 'US', 'CA', 'MX', 'BR', 'AU', 'NZ', 'JP', 'KR', 'CN', 'IN'] as const;
export const POLARIZATIONS: Polarization[] = ['linear', 'RHCP', 'LHCP', 'any'];
export const CONNECTOR_LABELS: Record<Connector, string> = {
  'solder-pad': 'Solder pad',
  SMA: 'SMA',
  'RP-SMA': 'RP-SMA',
  MMCX: 'MMCX',
  MCX: 'MCX',
  N: 'N',
  'micro-coax': 'Micro-coax',
};
