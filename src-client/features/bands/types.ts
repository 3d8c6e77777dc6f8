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
