import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidatePart } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';
import type { MeasurementBasis, MeasurementKind, MeasurementUploadResult } from '../types';

/** The multipart form of POST /parts/:id/measurements, with the browser's File and the fields as typed. */
export interface MeasurementUpload {
  id: number;
  file: File;
  kind: MeasurementKind;
  /** Efficiency radiation | total, gains peak | realized; none for S11. */
  basis?: MeasurementBasis;
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
  return apiRequest<MeasurementUploadResult>(`/parts/${id}/measurements`, {
    method: 'POST',
    form,
    onUploadProgress: onProgress ?? (() => {}),
  });
};

/** A dry run stores nothing, so only a real upload refreshes the part and the verdicts it feeds. */
export const useUploadMeasurement = () => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: uploadMeasurement, onSuccess: (_result, input) => (input.dryRun ? undefined : invalidatePart(queryClient, input.id)) });
};
