export const ruleKeys = {
  all: ['rules'] as const,
  list: () => [...ruleKeys.all, 'list'] as const,
  detail: (id: string) => [...ruleKeys.all, 'detail', id] as const,
  versions: (id: string) => [...ruleKeys.all, 'versions', id] as const,
};
