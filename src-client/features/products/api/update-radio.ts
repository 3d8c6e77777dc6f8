import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidateRadio } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';
import type { Radio, RadioUpdate } from '../types';

export const updateRadio = ({ productId, radioId, ...input }: RadioUpdate & { productId: number; radioId: number }) =>
  apiRequest<Radio>(`/products/${productId}/radios/${radioId}`, { method: 'PATCH', body: input });

/** The product's matrix and candidates are computed from its radios, so they refresh with it. */
export const useUpdateRadio = () => {
  const queryClient = useQueryClient();
  // Settled, not success: after a version conflict the editor can show what the other person saved.
  return useMutation({ mutationFn: updateRadio, onSettled: (_radio, _error, input) => invalidateRadio(queryClient, input.productId) });
};
