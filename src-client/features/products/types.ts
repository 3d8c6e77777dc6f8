import type { components } from '../../lib/api-types';
import type { AsTyped } from '../../lib/form-input';

type Schemas = components['schemas'];
export type Technology = Schemas['Technology'];
export type RangeRole = Schemas['RangeRole'];
export type Polarization = Schemas['RadioPolarization'];
export type Connector = Schemas['Connector'];
export type Region = Schemas['Region'];

/** A band of the library, to pick for a radio. */
export type BandChoice = Schemas['BandDto'];

/** A band set, to add its bands to a radio at once. */
export type BandSetChoice = Schemas['BandSetDto'];

export type ProductSummary = Schemas['ProductSummaryDto'];

export type Radio = Schemas['RadioDto'];

export type ProductDetail = Schemas['ProductDetailDto'];

export type ProductInput = AsTyped<Schemas['CreateProductDto']>;

export type ProductUpdate = AsTyped<Schemas['UpdateProductDto']>;

export type RadioInput = AsTyped<Schemas['CreateRadioDto']>;

export type RadioUpdate = AsTyped<Schemas['UpdateRadioDto']>;

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
export const REGIONS = ['global', 'EU', 'CEPT', 'ASIA', 'GB', 'US', 'CA', 'MX', 'BR', 'AU', 'NZ', 'JP', 'KR', 'CN', 'IN'] as const satisfies readonly Region[];
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
