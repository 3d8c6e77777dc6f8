export type Technology = 'lte' | 'nr' | 'gnss' | 'wifi' | 'ble' | 'ism' | 'uwb' | 'other';
export type RangeRole = 'uplink' | 'downlink' | 'tdd' | 'receive' | 'transmit-receive';

export interface Band {
  id: number;
  technology: Technology;
  designation: string;
  name: string;
  ranges: { role: RangeRole; fromMhz: number; toMhz: number }[];
  duplex: 'FDD' | 'TDD' | 'receive-only' | 'half-duplex';
  source: { document: string; table: string; note: string | null };
  centreMhz: number | null;
  bandwidthMhz: number | null;
  regions: string[];
}

export interface BandFilter {
  technology?: Technology;
  fromMhz?: number;
  toMhz?: number;
}

export interface BandSet {
  id: number;
  name: string;
  description: string;
  bandIds: number[];
  bands: { id: number; technology: Technology; designation: string; name: string }[];
  version: number;
  updatedAt: string;
}

export interface BandSetInput {
  name: string;
  description: string;
  bandIds: number[];
}

export type LimitKind = 'eirp' | 'erp' | 'conducted-gain-rule';

export interface RegulatoryLimit {
  id: number;
  region: string;
  title: string;
  fromMhz: number;
  toMhz: number;
  kind: LimitKind;
  valueDbm: number;
  valueText: string;
  gainThresholdDbi: number | null;
  reductionDbPerDb: number | null;
  conditions: string | null;
  source: string;
  note: string | null;
  updatedAt: string;
}

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

export const REGIONS = ['global', 'EU', 'UK', 'US', 'CA', 'MX', 'BR', 'AU', 'NZ', 'JP', 'KR', 'CN', 'IN', 'AS'] as const;

export const LIMIT_KIND_LABELS: Record<LimitKind, string> = {
  eirp: 'EIRP',
  erp: 'ERP',
  'conducted-gain-rule': 'Conducted power with antenna-gain rule',
};
