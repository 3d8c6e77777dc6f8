import type { Role } from '../../../lib/session';

export const ROLE_OPTIONS: { value: Role; label: string }[] = [
  { value: 'procurement', label: 'Procurement' },
  { value: 'engineer', label: 'Engineer' },
  { value: 'admin', label: 'Admin' },
];
