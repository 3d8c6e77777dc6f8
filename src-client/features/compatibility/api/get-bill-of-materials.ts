import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { matrixKeys } from '../../../api/query-keys';
import { apiRequest } from '../../../lib/api-client';
import type { BillOfMaterials } from '../types';

export const getBillOfMaterials = (productId: number, quantity: number) =>
  apiRequest<BillOfMaterials>(`/products/${productId}/bill-of-materials`, { query: { quantity } });

export const getBillOfMaterialsQueryOptions = (productId: number, quantity: number) =>
  queryOptions({ queryKey: matrixKeys.billOfMaterials(productId, quantity), queryFn: () => getBillOfMaterials(productId, quantity) });

/** Keeps the previous quantity's figures on screen while the next one loads. */
export const useBillOfMaterials = (productId: number, quantity: number) =>
  useQuery({ ...getBillOfMaterialsQueryOptions(productId, quantity), placeholderData: keepPreviousData });
