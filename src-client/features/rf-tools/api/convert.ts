import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { rfToolKeys } from '../../../api/query-keys';
import { apiRequest } from '../../../lib/api-client';
import type { ConversionRequest, ConversionResponse } from '../types';

export const convert = (input: ConversionRequest) => apiRequest<ConversionResponse>('/rf/conversions', { method: 'POST', body: input });

export const getConversionQueryOptions = (input: ConversionRequest) =>
  queryOptions({ queryKey: rfToolKeys.conversion(input), queryFn: () => convert(input), staleTime: Infinity, retry: false });

/** Pure computation: cached for good, and the last answer stays shown while the next one loads. */
export const useConversion = (input: ConversionRequest | null) =>
  useQuery({ ...getConversionQueryOptions(input ?? { vswr: 1 }), enabled: input !== null, placeholderData: keepPreviousData });
