import type { RouteObject } from 'react-router-dom';
import { paths } from './paths';
import { RequireAuth } from '../RequireAuth';

/** Pages inside the app shell, each loaded on first visit (route-level code splitting). */
export const protectedRoutes: RouteObject[] = [
  {
    path: paths.users,
    lazy: async () => {
      const { UsersPage } = await import('../../features/users/components/UsersPage');
      return { element: <RequireAuth roles={['admin']}><UsersPage /></RequireAuth> };
    },
  },
  {
    path: paths.audit,
    lazy: async () => {
      const { AuditLogPage } = await import('../../features/audit/components/AuditLogPage');
      return { element: <RequireAuth roles={['admin']}><AuditLogPage /></RequireAuth> };
    },
  },
  {
    path: paths.tools,
    lazy: async () => {
      const { ToolsPage } = await import('../../features/tools/components/ToolsPage');
      return { element: <RequireAuth><ToolsPage /></RequireAuth> };
    },
  },
];
