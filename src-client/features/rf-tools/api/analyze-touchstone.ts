import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { MatchCriterionName, TouchstoneAnalysis } from '../types';

export interface AnalyzeInput {
  file: File;
  port: number;
  criterion: MatchCriterionName;
  vswrMax?: number;
  onUploadProgress?: (fraction: number) => void;
}

export const analyzeTouchstone = ({ file, port, criterion, vswrMax, onUploadProgress }: AnalyzeInput) => {
  const form = new FormData();
  form.append('port', String(port));
  form.append('criterion', criterion);
  if (vswrMax !== undefined) form.append('vswrMax', String(vswrMax));
  form.append('file', file);
  return apiRequest<TouchstoneAnalysis>('/rf/touchstone/analyze', { method: 'POST', form, onUploadProgress });
};

/** An upload, so a mutation: nothing is stored and nothing needs invalidating. */
export const useAnalyzeTouchstone = () => useMutation({ mutationFn: analyzeTouchstone });
