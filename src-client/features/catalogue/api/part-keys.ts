import type { PartFilters } from '../types';

export const partKeys = {
  all: ['parts'] as const,
  lists: () => [...partKeys.all, 'list'] as const,
  list: (filters: PartFilters) => [...partKeys.lists(), filters] as const,
  detail: (id: number, ranges?: string) => [...partKeys.all, 'detail', id, ranges ?? ''] as const,
  details: (id: number) => [...partKeys.all, 'detail', id] as const,
  points: (id: number, measurementId: number) => [...partKeys.all, 'points', id, measurementId] as const,
  history: (id: number) => [...partKeys.all, 'history', id] as const,
  reviewQueue: () => [...partKeys.all, 'review-queue'] as const,
  bands: () => ['catalogue-bands'] as const,
};
