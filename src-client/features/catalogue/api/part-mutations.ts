import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { CurvePreview, Measurement, MeasurementKind, Offer, PartDetail, PartDocument, SpecBand } from '../types';
import { partKeys } from './part-keys';

export type PartInput = Partial<Omit<PartDetail, 'specBands'>> & { specBands?: Omit<SpecBand, 'id'>[] };

export const createPart = (input: PartInput) => apiRequest<PartDetail>('/parts', { method: 'POST', body: input });
export const updatePart = ({ id, ...input }: PartInput & { id: number; version: number }) => apiRequest<PartDetail>(`/parts/${id}`, { method: 'PATCH', body: input });

export type ReviewAction = 'submission' | 'approval' | 'rejection' | 'restriction' | 'reinstatement' | 'retirement';
export const reviewPart = ({ id, action, version, comment }: { id: number; action: ReviewAction; version: number; comment?: string }) =>
  apiRequest<PartDetail>(`/parts/${id}/${action}`, { method: 'POST', body: { version, ...(comment ? { comment } : {}) } });

export interface MeasurementUpload {
  id: number;
  file: File;
  kind: MeasurementKind;
  groundLengthMm?: string;
  groundWidthMm?: string;
  conditions?: string;
  frequencyUnit?: string;
  valueUnit?: string;
  dryRun: boolean;
  onProgress?: (fraction: number) => void;
}

export const uploadMeasurement = ({ id, file, onProgress, dryRun, ...fields }: MeasurementUpload) => {
  const form = new FormData();
  form.set('kind', fields.kind);
  for (const [key, value] of Object.entries(fields)) if (value && key !== 'kind') form.set(key, String(value));
  if (dryRun) form.set('dryRun', 'true');
  form.set('file', file);
  return apiRequest<{ measurement: Measurement | null; preview: CurvePreview }>(`/parts/${id}/measurements`, { method: 'POST', form, onUploadProgress: onProgress ?? (() => {}) });
};

export const uploadDocument = ({ id, file, kind, title, onProgress }: { id: number; file: File; kind: string; title?: string; onProgress?: (f: number) => void }) => {
  const form = new FormData();
  form.set('kind', kind);
  if (title) form.set('title', title);
  form.set('file', file);
  return apiRequest<PartDocument>(`/parts/${id}/documents`, { method: 'POST', form, onUploadProgress: onProgress ?? (() => {}) });
};

export type OfferInput = Omit<Offer, 'id' | 'version'>;
export const createOffer = ({ id, ...offer }: OfferInput & { id: number }) => apiRequest<Offer>(`/parts/${id}/offers`, { method: 'POST', body: offer });
export const deleteOffer = ({ id, offerId }: { id: number; offerId: number }) => apiRequest<void>(`/parts/${id}/offers/${offerId}`, { method: 'DELETE' });
export const deleteMeasurement = ({ id, measurementId }: { id: number; measurementId: number }) => apiRequest<void>(`/parts/${id}/measurements/${measurementId}`, { method: 'DELETE' });

/** Every catalogue mutation invalidates through the key factory: lists, details and the queue. */
function usePartMutation<TInput, TResult>(fn: (input: TInput) => Promise<TResult>) {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: fn, onSuccess: () => queryClient.invalidateQueries({ queryKey: partKeys.all }) });
}

export const useCreatePart = () => usePartMutation(createPart);
export const useUpdatePart = () => usePartMutation(updatePart);
export const useReviewPart = () => usePartMutation(reviewPart);
export const useUploadMeasurement = () => usePartMutation(uploadMeasurement);
export const useUploadDocument = () => usePartMutation(uploadDocument);
export const useCreateOffer = () => usePartMutation(createOffer);
export const useDeleteOffer = () => usePartMutation(deleteOffer);
export const useDeleteMeasurement = () => usePartMutation(deleteMeasurement);
