import { queryOptions, useQuery } from '@tanstack/react-query';
import { partKeys } from '../../../api/query-keys';
import { apiRequest } from '../../../lib/api-client';
import type { OfferRemoval } from '../types';

export const getOfferRemovals = (id: number) => apiRequest<OfferRemoval[]>(`/parts/${id}/offer-removals`);

export const getOfferRemovalsQueryOptions = (id: number) => queryOptions({ queryKey: partKeys.offerRemovals(id), queryFn: () => getOfferRemovals(id) });

/** Removals of this part's offers that can still be undone (asked only by those who may edit sourcing). */
export const useOfferRemovals = (id: number, enabled: boolean) => useQuery({ ...getOfferRemovalsQueryOptions(id), enabled });
