export const ROLES = ['procurement', 'engineer', 'admin'] as const;
export type Role = (typeof ROLES)[number];
export const ALL_ROLES: Role[] = [...ROLES];
