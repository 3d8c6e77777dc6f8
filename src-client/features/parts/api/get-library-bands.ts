import { useQuery } from '@tanstack/react-query';
import { getBandsQueryOptions } from '../../../api/bands';

/** The band library, for the coverage filter and the chart overlays. */
export const useLibraryBands = () => useQuery(getBandsQueryOptions());
