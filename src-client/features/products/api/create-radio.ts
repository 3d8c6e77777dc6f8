import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidateRadio } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';
import type { Radio, RadioInput } from '../types';

export const createRadio = ({ productId, ...input }: RadioInput & { productId: number }) =>
  apiRequest<Radio>(`/products/${productId}/radios`, { method: 'POST', body: input });

export const useCreateRadio = () => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createRadio, onSettled: (_radio, _error, input) => invalidateRadio(queryClient, input.productId) });
};
