export const limitKeys = {
  all: ['regulatory-limits'] as const,
  list: () => [...limitKeys.all, 'list'] as const,
};
