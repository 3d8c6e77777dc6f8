import { useQuery } from '@tanstack/react-query';
import { getBandsQueryOptions } from '../../../api/bands';
import type { LibraryBand } from '../types';

/** The band library, for the coverage filter and the chart overlays. */
export const getLibraryBandsQueryOptions = () => getBandsQueryOptions<LibraryBand>();

export const useLibraryBands = () => useQuery(getLibraryBandsQueryOptions());
