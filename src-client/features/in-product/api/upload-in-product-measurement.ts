import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidateInProduct } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';
import type { InProductMeasurement } from '../types';

/** The multipart form of POST /products/:id/in-product-measurements. */
export interface InProductUpload {
  productId: number;
  file: File;
  note?: string;
  onProgress?: (fraction: number) => void;
}

export const uploadInProductMeasurement = ({ productId, file, note, onProgress }: InProductUpload) => {
  const form = new FormData();
  if (note?.trim()) form.set('note', note.trim());
  form.set('file', file);
  return apiRequest<InProductMeasurement>(`/products/${productId}/in-product-measurements`, {
    method: 'POST',
    form,
    onUploadProgress: onProgress ?? (() => {}),
  });
};

export const useUploadInProductMeasurement = () => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: uploadInProductMeasurement, onSuccess: (_result, input) => invalidateInProduct(queryClient, input.productId) });
};
