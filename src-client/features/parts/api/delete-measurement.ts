import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidatePart } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';

export const deleteMeasurement = ({ id, measurementId }: { id: number; measurementId: number }) =>
  apiRequest<void>(`/parts/${id}/measurements/${measurementId}`, { method: 'DELETE' });

export const useDeleteMeasurement = () => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: deleteMeasurement, onSuccess: (_result, input) => invalidatePart(queryClient, input.id) });
};
