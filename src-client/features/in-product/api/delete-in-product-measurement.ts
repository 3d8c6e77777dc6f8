import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidateInProduct } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';

export const deleteInProductMeasurement = ({ productId, measurementId }: { productId: number; measurementId: number }) =>
  apiRequest<void>(`/products/${productId}/in-product-measurements/${measurementId}`, { method: 'DELETE' });

/** Settled, not success: a file someone else deleted first leaves the list too. */
export const useDeleteInProductMeasurement = () => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: deleteInProductMeasurement, onSettled: (_result, _error, input) => invalidateInProduct(queryClient, input.productId) });
};
