import { queryOptions, useQuery } from '@tanstack/react-query';
import { matrixKeys } from '../../../api/query-keys';
import { apiRequest } from '../../../lib/api-client';
import type { ProductEvaluation } from '../types';

export const getEvaluation = (productId: number) => apiRequest<ProductEvaluation>(`/products/${productId}/evaluation`);

export const getEvaluationQueryOptions = (productId: number) =>
  queryOptions({ queryKey: matrixKeys.evaluation(productId), queryFn: () => getEvaluation(productId) });

export const useEvaluation = (productId: number) => useQuery(getEvaluationQueryOptions(productId));
