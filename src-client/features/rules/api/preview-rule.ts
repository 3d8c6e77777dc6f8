import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import type { RulePreview } from '../types';

export const previewRule = (definition: unknown) => apiRequest<RulePreview>('/rules/preview', { method: 'POST', body: { definition } });

/** A dry run against every product, so a mutation: nothing is stored and nothing needs invalidating. */
export const usePreviewRule = () => useMutation({ mutationFn: previewRule });
