import { queryOptions, useQuery } from '@tanstack/react-query';
import { inProductKeys } from '../../../api/query-keys';
import { apiRequest } from '../../../lib/api-client';
import type { InProductMeasurement } from '../types';

export const getInProductMeasurements = (productId: number) => apiRequest<InProductMeasurement[]>(`/products/${productId}/in-product-measurements`);

export const getInProductMeasurementsQueryOptions = (productId: number) =>
  queryOptions({ queryKey: inProductKeys.list(productId), queryFn: () => getInProductMeasurements(productId) });

export const useInProductMeasurements = (productId: number) => useQuery(getInProductMeasurementsQueryOptions(productId));
