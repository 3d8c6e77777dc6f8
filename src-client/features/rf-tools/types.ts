import type { components } from '../../lib/api-types';

/** Shapes of the /api/rf answers, from the server's OpenAPI document (src-server/rf-tools/dto). */
type Schemas = components['schemas'];

export type FrequencyRange = Schemas['FrequencyRangeDto'];

export type CurvePoint = Schemas['CurvePointDto'];

export type MatchCriterionName = Schemas['MatchCriterion'];

export type TouchstoneAnalysis = Schemas['TouchstoneAnalysisDto'];

export type MatchingElement = Schemas['MatchingElementDto'];

export type SweepPoint = Schemas['SweepPointDto'];

export type MatchingNetwork = Schemas['NetworkDto'];

export type MatchingSolution = Schemas['MatchingSolutionDto'];

export type MatchingRequest = Schemas['MatchingRequestDto'];

export type MatchingResponse = Schemas['MatchingResponseDto'];

export type LinkBudgetRequest = Schemas['LinkBudgetRequestDto'];

export type LinkBudgetResponse = Schemas['LinkBudgetResponseDto'];

/** Exactly one known quantity (z0Ohms only beside impedanceOhms); the server refuses more. */
export type ConversionRequest = Schemas['ConversionRequestDto'];

export type Reflection = Schemas['ReflectionDto'];

export type ConversionResponse = Schemas['ConversionResponseDto'];

/** A band to overlay on a plot (client view: a library band spanned from its lowest to its highest edge). */
export interface OverlayBand {
  key: string;
  label: string;
  fromHz: number;
  toHz: number;
}
