import type { ReactNode } from 'react';
import { Card, Classes, Elevation, H2 } from '@blueprintjs/core';
import { BrandMark } from '../../../components/BrandMark';

export interface AuthLayoutProps {
  title: string;
  children: ReactNode;
}

/** The centred card that every signed-out page uses. */
export function AuthLayout({ title, children }: AuthLayoutProps) {
  return (
    <div className="bw-auth">
      <div className="bw-auth__brand">
        <BrandMark size={40} />
        <div>
          <div className="bw-auth__name">Bandwright</div>
          <div className={Classes.TEXT_MUTED}>Antenna parts, band plans, compatibility</div>
        </div>
      </div>
      <Card elevation={Elevation.TWO} className="bw-auth__card">
        <H2>{title}</H2>
        {children}
      </Card>
    </div>
  );
}
