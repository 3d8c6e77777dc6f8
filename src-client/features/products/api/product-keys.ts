export const productKeys = {
  all: ['products'] as const,
  list: () => [...productKeys.all, 'list'] as const,
  deleted: () => [...productKeys.all, 'deleted'] as const,
  detail: (id: number) => [...productKeys.all, 'detail', id] as const,
  history: (id: number) => [...productKeys.all, 'history', id] as const,
  bandChoices: () => [...productKeys.all, 'band-choices'] as const,
};
