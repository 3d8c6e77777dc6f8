import type { ReactNode } from 'react';
import { Navigate, useLocation } from 'react-router-dom';
import { NonIdealState, Spinner } from '@blueprintjs/core';
import { Role, useSession } from '../lib/session';
import { paths } from './routes/paths';

export interface RequireAuthProps {
  children: ReactNode;
  /** Roles that may see the page; any signed-in role when omitted. */
  roles?: Role[];
}

export function RequireAuth({ children, roles }: RequireAuthProps) {
  const { user, loading } = useSession();
  const location = useLocation();
  if (loading) return <Spinner className="bw-spinner" />;
  if (!user) return <Navigate to={paths.signIn} replace state={{ from: location.pathname + location.search }} />;
  if (roles && !roles.includes(user.role)) {
    return <NonIdealState icon="lock" title="Not for your role" description="Ask an admin if you need access to this page." />;
  }
  return <>{children}</>;
}
