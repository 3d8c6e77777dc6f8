import type { ReactNode } from 'react';
import { NonIdealState, Spinner } from '@blueprintjs/core';

export interface QueryStateProps {
  isPending: boolean;
  error: unknown;
  children: ReactNode;
}

/** Spinner while loading, the error's own message when it failed, the content otherwise. */
export function QueryState({ isPending, error, children }: QueryStateProps) {
  if (error) return <NonIdealState icon="error" title="Could not load this" description={(error as Error).message} />;
  if (isPending) return <Spinner className="bw-spinner" />;
  return <>{children}</>;
}
