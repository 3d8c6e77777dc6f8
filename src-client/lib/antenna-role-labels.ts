import type { components } from './api-types';

export type AntennaRole = components['schemas']['AntennaRole'];

/** Each antenna of a radio in words, as the verdict, the candidates and the in-product port mapping show it. */
export const ANTENNA_ROLE_LABELS: Record<AntennaRole, string> = {
  main: 'main',
  diversity: 'diversity',
  'mimo-2': 'MIMO 2',
  'mimo-3': 'MIMO 3',
  'mimo-4': 'MIMO 4',
};
