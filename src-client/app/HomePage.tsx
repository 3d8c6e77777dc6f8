import { Navigate } from 'react-router-dom';
import { NonIdealState } from '@blueprintjs/core';
import { useSession } from '../lib/session';
import { navigation } from './navigation';

/** Sends each role to the first page it may use. */
export function HomePage() {
  const { user } = useSession();
  const first = navigation.find((entry) => user && entry.roles.includes(user.role));
  if (first) return <Navigate to={first.path} replace />;
  return <NonIdealState icon="path-search" title="Nothing here yet" />;
}
