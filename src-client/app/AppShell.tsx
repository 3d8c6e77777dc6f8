import { Suspense } from 'react';
import { NavLink, Outlet } from 'react-router-dom';
import { Button, Classes, Icon, Spinner, Tag } from '@blueprintjs/core';
import { BrandMark } from '../components/BrandMark';
import { useReviewQueueCount } from '../api/review-queue';
import { useSession } from '../lib/session';
import { navigation, NavEntry } from './navigation';
import { paths } from './routes/paths';

const SECTION_TITLES: Record<NavEntry['section'], string> = { work: 'Work', reference: 'Reference', admin: 'Administration' };
const ROLE_LABELS = { procurement: 'Procurement', engineer: 'Engineer', admin: 'Admin' } as const;

export function AppShell() {
  const { user, signOut } = useSession();
  const waiting = useReviewQueueCount(user?.role === 'admin');
  if (!user) return null;
  const visible = navigation.filter((entry) => entry.roles.includes(user.role));
  const sections = (['work', 'reference', 'admin'] as const).filter((s) => visible.some((e) => e.section === s));

  return (
    <div className="bw-shell">
      <nav className={`bw-rail ${Classes.DARK}`} aria-label="Main">
        <div className="bw-rail__brand">
          <BrandMark />
          <span className="bw-rail__name">Bandwright</span>
        </div>
        {sections.map((section) => (
          <div key={section} className="bw-rail__section">
            <div className="bw-rail__section-title">{SECTION_TITLES[section]}</div>
            {visible
              .filter((entry) => entry.section === section)
              .map((entry) => (
                <NavLink key={entry.path} to={entry.path} className={({ isActive }) => `bw-rail__link${isActive ? ' bw-rail__link--active' : ''}`}>
                  <Icon icon={entry.icon} size={16} />
                  <span>{entry.label}</span>
                  {entry.path === paths.reviewQueue && waiting !== undefined && (
                    <Tag
                      round
                      minimal={waiting === 0}
                      intent={waiting > 0 ? 'primary' : 'none'}
                      style={{ marginLeft: 'auto' }}
                      data-testid="review-queue-count"
                    >
                      <span className="bw-visually-hidden">parts waiting: </span>
                      {waiting}
                    </Tag>
                  )}
                </NavLink>
              ))}
          </div>
        ))}
        <div className="bw-rail__user">
          <div className="bw-rail__user-name">{user.name}</div>
          <div className="bw-rail__user-meta">
            <Tag minimal round data-testid="current-role">
              {ROLE_LABELS[user.role]}
            </Tag>
            <Button variant="minimal" size="small" icon="log-out" text="Sign out" onClick={() => signOut()} />
          </div>
        </div>
      </nav>
      <main className="bw-main">
        <Suspense fallback={<Spinner className="bw-spinner" />}>
          <Outlet />
        </Suspense>
      </main>
    </div>
  );
}
