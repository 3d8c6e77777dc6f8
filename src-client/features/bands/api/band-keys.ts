import type { BandFilter } from '../types';

export const bandKeys = {
  all: ['bands'] as const,
  list: (filter: BandFilter) => [...bandKeys.all, 'list', filter] as const,
  sets: () => [...bandKeys.all, 'sets'] as const,
  limits: () => [...bandKeys.all, 'limits'] as const,
};
