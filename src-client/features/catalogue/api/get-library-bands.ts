import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { LibraryBand } from '../types';
import { partKeys } from './part-keys';

/** The band library, for the coverage filter and the chart overlays. */
export const getLibraryBands = () => apiRequest<LibraryBand[]>('/bands');

export const getLibraryBandsQueryOptions = () => queryOptions({ queryKey: partKeys.bands(), queryFn: getLibraryBands, staleTime: 10 * 60_000 });

export const useLibraryBands = () => useQuery(getLibraryBandsQueryOptions());
