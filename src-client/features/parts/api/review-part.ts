import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidatePart } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';
import type { PartDetail, ReviewDecision } from '../types';

/** The last segment of the review routes (POST /parts/:id/approval …). */
export type ReviewAction = 'submission' | 'approval' | 'rejection' | 'restriction' | 'reinstatement' | 'retirement';

export const reviewPart = ({ id, action, version, comment }: ReviewDecision & { id: number; action: ReviewAction }) =>
  apiRequest<PartDetail>(`/parts/${id}/${action}`, { method: 'POST', body: { version, ...(comment ? { comment } : {}) } satisfies ReviewDecision });

/** An approval, restriction or retirement changes which parts the matrices and candidates consider. */
export const useReviewPart = () => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: reviewPart, onSuccess: (_part, input) => invalidatePart(queryClient, input.id) });
};
