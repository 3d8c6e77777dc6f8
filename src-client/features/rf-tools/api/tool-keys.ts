import type { ConversionRequest, LinkBudgetRequest, MatchingRequest } from '../types';

export const toolKeys = {
  all: ['rf-tools'] as const,
  conversion: (input: ConversionRequest) => [...toolKeys.all, 'conversion', input] as const,
  linkBudget: (input: LinkBudgetRequest) => [...toolKeys.all, 'link-budget', input] as const,
  matching: (input: MatchingRequest) => [...toolKeys.all, 'matching', input] as const,
};
