export const compatibilityKeys = {
  all: ['compatibility'] as const,
  matrix: (productId: number) => [...compatibilityKeys.all, 'matrix', productId] as const,
  candidates: (productId: number, radioId: number) => [...compatibilityKeys.all, 'candidates', productId, radioId] as const,
  partMeasurements: (partId: number) => [...compatibilityKeys.all, 'part-measurements', partId] as const,
  points: (partId: number, measurementId: number) => [...compatibilityKeys.all, 'points', partId, measurementId] as const,
};
