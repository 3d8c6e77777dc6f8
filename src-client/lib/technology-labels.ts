import type { components } from './api-types';

/** Each radio technology in words, as the band library, band sets and limits show it. */
export const TECHNOLOGY_LABELS: Record<components['schemas']['Technology'], string> = {
  lte: 'LTE (incl. LTE-M, NB-IoT)',
  nr: '5G NR',
  gnss: 'GNSS',
  wifi: 'Wi-Fi',
  ble: 'Bluetooth LE',
  ism: 'Sub-GHz ISM / LoRaWAN',
  uwb: 'UWB',
  other: 'Other',
};
