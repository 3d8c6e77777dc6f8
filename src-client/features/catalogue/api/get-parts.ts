import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest, buildUrl, tokenStore } from '../../../lib/api-client';
import type { PartFilters, PartList } from '../types';
import { partKeys } from './part-keys';

export const getParts = (filters: PartFilters) => apiRequest<PartList>('/parts', { query: { ...filters } });

export const getPartsQueryOptions = (filters: PartFilters) =>
  queryOptions({ queryKey: partKeys.list(filters), queryFn: () => getParts(filters), placeholderData: keepPreviousData });

export const useParts = (filters: PartFilters) => useQuery(getPartsQueryOptions(filters));

/** The current search as a CSV file download (the export route needs the bearer token, so fetch then save). */
export async function downloadPartsCsv(filters: PartFilters): Promise<void> {
  const { limit: _limit, offset: _offset, ...rest } = filters;
  const text = await apiRequest<string>('/parts/export', { query: { ...rest }, raw: true });
  const url = URL.createObjectURL(new Blob([text], { type: 'text/csv' }));
  const link = document.createElement('a');
  link.href = url;
  link.download = 'bandwright-catalogue.csv';
  document.body.append(link);
  link.click();
  link.remove();
  URL.revokeObjectURL(url);
}

/** Absolute URL of a stored file, fetched with the token and opened as a download. */
export async function downloadStoredFile(path: string, fileName: string): Promise<void> {
  const response = await fetch(buildUrl(path), { headers: { Authorization: `Bearer ${tokenStore.get() ?? ''}` } });
  if (!response.ok) throw new Error(`Download failed (${response.status})`);
  const url = URL.createObjectURL(await response.blob());
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  document.body.append(link);
  link.click();
  link.remove();
  URL.revokeObjectURL(url);
}
