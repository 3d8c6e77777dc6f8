import type { Role } from '../../lib/session';

export interface UserRow {
  id: number;
  email: string;
  name: string;
  role: Role;
  status: 'invited' | 'active' | 'deactivated';
  createdAt: string;
}
