import type { ReactNode } from 'react';
import { Classes, H1 } from '@blueprintjs/core';

export interface PageHeaderProps {
  title: string;
  subtitle?: ReactNode;
  actions?: ReactNode;
}

export function PageHeader({ title, subtitle, actions }: PageHeaderProps) {
  return (
    <header className="bw-page-header">
      <div>
        <H1 className="bw-page-header__title">{title}</H1>
        {subtitle && <div className={Classes.TEXT_MUTED}>{subtitle}</div>}
      </div>
      {actions && <div className="bw-page-header__actions">{actions}</div>}
    </header>
  );
}
