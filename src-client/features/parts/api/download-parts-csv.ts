import { downloadFromApi } from '../../../lib/download';
import type { PartFilters } from '../types';

/** The current search (all its pages) as a CSV file. */
export function downloadPartsCsv(filters: PartFilters): Promise<void> {
  const { limit: _limit, offset: _offset, ...rest } = filters;
  return downloadFromApi('/parts/export', 'bandwright-catalogue.csv', { ...rest });
}
