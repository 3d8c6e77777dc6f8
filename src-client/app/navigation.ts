import type { IconName } from '@blueprintjs/icons';
import type { Role } from '../lib/session';
import { paths } from './routes/paths';

export interface NavEntry {
  label: string;
  path: string;
  icon: IconName;
  roles: Role[];
  section: 'work' | 'reference' | 'admin';
}

const everyone: Role[] = ['procurement', 'engineer', 'admin'];

/** The left rail; each entry shows only to the roles that may use it. */
export const navigation: NavEntry[] = [
  { label: 'Catalogue', path: paths.catalogue, icon: 'th-list', roles: everyone, section: 'work' },
  { label: 'Review queue', path: paths.reviewQueue, icon: 'endorsed', roles: ['admin'], section: 'work' },
  { label: 'Products', path: paths.products, icon: 'box', roles: everyone, section: 'work' },
  { label: 'Band library', path: paths.bands, icon: 'cell-tower', roles: everyone, section: 'reference' },
  { label: 'Tools', path: paths.tools, icon: 'calculator', roles: everyone, section: 'reference' },
  { label: 'Rules', path: paths.rules, icon: 'properties', roles: ['admin', 'engineer'], section: 'admin' },
  { label: 'Users', path: paths.users, icon: 'people', roles: ['admin'], section: 'admin' },
  { label: 'Audit log', path: paths.audit, icon: 'history', roles: ['admin'], section: 'admin' },
];
