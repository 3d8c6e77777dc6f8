import { useMutation, useQueryClient } from '@tanstack/react-query';
import { invalidatePart } from '../../../api/invalidation';
import { apiRequest } from '../../../lib/api-client';
import type { DocumentKind, PartDocument } from '../types';

/** The multipart form of POST /parts/:id/documents, with the browser's File. */
export interface DocumentUpload {
  id: number;
  file: File;
  kind: DocumentKind;
  title?: string;
  onProgress?: (fraction: number) => void;
}

export const uploadDocument = ({ id, file, kind, title, onProgress }: DocumentUpload) => {
  const form = new FormData();
  form.set('kind', kind);
  if (title) form.set('title', title);
  form.set('file', file);
  return apiRequest<PartDocument>(`/parts/${id}/documents`, { method: 'POST', form, onUploadProgress: onProgress ?? (() => {}) });
};

export const useUploadDocument = () => {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: uploadDocument, onSuccess: (_document, input) => invalidatePart(queryClient, input.id) });
};
