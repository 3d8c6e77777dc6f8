import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { Assignment } from '../types';
import { compatibilityKeys } from './compatibility-keys';

interface Target {
  productId: number;
  radioId: number;
  partId: number;
}

export const shortlistPart = ({ productId, radioId, partId }: Target) =>
  apiRequest<Assignment[]>(`/products/${productId}/radios/${radioId}/shortlist`, { method: 'POST', body: { partId } });

export const choosePart = ({ productId, radioId, partId }: Target) =>
  apiRequest<Assignment[]>(`/products/${productId}/radios/${radioId}/choice`, { method: 'PUT', body: { partId } });

export const removeFromShortlist = ({ productId, radioId, partId }: Target) =>
  apiRequest<Assignment[]>(`/products/${productId}/radios/${radioId}/shortlist/${partId}`, { method: 'DELETE' });

function useAssignmentMutation(mutationFn: (target: Target) => Promise<Assignment[]>) {
  const queryClient = useQueryClient();
  // The matrix columns and the candidates' assignment tags both change.
  return useMutation({ mutationFn, onSuccess: () => queryClient.invalidateQueries({ queryKey: compatibilityKeys.all }) });
}

export const useShortlistPart = () => useAssignmentMutation(shortlistPart);
export const useChoosePart = () => useAssignmentMutation(choosePart);
export const useRemoveFromShortlist = () => useAssignmentMutation(removeFromShortlist);
