import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { Radio, RadioInput } from '../types';
import { productKeys } from './product-keys';

export const createRadio = ({ productId, ...input }: RadioInput & { productId: number }) =>
  apiRequest<Radio>(`/products/${productId}/radios`, { method: 'POST', body: input });
export const updateRadio = ({ productId, radioId, ...input }: Partial<RadioInput> & { productId: number; radioId: number; version: number }) =>
  apiRequest<Radio>(`/products/${productId}/radios/${radioId}`, { method: 'PATCH', body: input });
export const deleteRadio = ({ productId, radioId, version }: { productId: number; radioId: number; version: number }) =>
  apiRequest<void>(`/products/${productId}/radios/${radioId}`, { method: 'DELETE', query: { version } });

// A 409 also refreshes, so the editor can show what the other person saved.
const useRadioMutation = <A extends { productId: number }, R>(fn: (arg: A) => Promise<R>) => {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: fn,
    onSettled: (_data, _error, arg) => Promise.all([
      queryClient.invalidateQueries({ queryKey: productKeys.detail(arg.productId) }),
      queryClient.invalidateQueries({ queryKey: productKeys.history(arg.productId) }),
      queryClient.invalidateQueries({ queryKey: productKeys.list() }),
    ]),
  });
};

export const useCreateRadio = () => useRadioMutation(createRadio);
export const useUpdateRadio = () => useRadioMutation(updateRadio);
export const useDeleteRadio = () => useRadioMutation(deleteRadio);
