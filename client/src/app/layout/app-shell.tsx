import { Suspense, useEffect } from 'react';
import { useQuery } from '@tanstack/react-query';
import { useTranslation } from 'react-i18next';
import { Link, NavLink, Outlet } from 'react-router';
import type { Role } from '@yardcall/shared';
import { BrandMark } from '@/components/ui/brand-mark';
import { Loading } from '@/components/ui/alert';
import { UserMenu } from '@/features/auth/components/user-menu';
import { showDisplaySettings } from '@/lib/display-settings';
import { meQueryOptions } from '@/lib/api/auth';
import { hasSession, SIGN_IN_PATH } from '@/lib/sign-in';
import { homePathFor } from '../role-homes';
import { useFocusedScreen } from './shell-handle';
import { SkipToMain } from './skip-to-main';

type NavKey = 'home' | 'start' | 'vehicles' | 'users' | 'outbox' | 'retention' | 'inspections';

const NAV_BY_ROLE: Record<Role, { key: NavKey; to: string }[]> = {
  driver: [
    { key: 'home', to: homePathFor('driver') },
    { key: 'start', to: '/driver/start' },
  ],
  mechanic: [
    { key: 'home', to: homePathFor('mechanic') },
    { key: 'vehicles', to: '/vehicles' },
  ],
  supervisor: [
    { key: 'home', to: homePathFor('supervisor') },
    { key: 'inspections', to: '/supervisor/inspections' },
    { key: 'vehicles', to: '/vehicles' },
  ],
  trainer: [{ key: 'home', to: homePathFor('trainer') }],
  admin: [
    { key: 'home', to: homePathFor('admin') },
    { key: 'users', to: '/admin/users' },
    { key: 'inspections', to: '/supervisor/inspections' },
    { key: 'vehicles', to: '/vehicles' },
    { key: 'outbox', to: '/admin/outbox' },
    { key: 'retention', to: '/admin/retention' },
  ],
};

// Drivers in training also practise narrated walk-arounds and read their trainer's feedback. The
// shell is on every page, so its words are in the core part.
const STUDENT_NAV = [
  { key: 'practice', to: '/training/practice' },
  { key: 'feedback', to: '/training/feedback' },
] as const;

const navLinkClass = ({ isActive }: { isActive: boolean }) =>
  `inline-flex min-h-tap items-center rounded-lg border-2 px-3 font-bold no-underline ${
    isActive ? 'border-ink underline' : 'border-transparent hover:border-line'
  }`;

export function AppShell() {
  const { t } = useTranslation();
  const signedIn = hasSession();
  const me = useQuery({ ...meQueryOptions(), enabled: signedIn });
  const user = signedIn ? me.data : undefined;
  const settings = user?.settings;
  const focused = useFocusedScreen();

  // The account's settings win over this device's cached ones once the user is known.
  useEffect(() => {
    if (settings) showDisplaySettings(settings);
  }, [settings]);

  return (
    <div className="flex min-h-screen flex-col">
      <SkipToMain />
      <header className="border-b-4 border-primary bg-surface">
        <div
          className={`mx-auto flex max-w-6xl flex-wrap items-center justify-between gap-tap-gap px-3 ${focused ? 'py-0' : 'py-2'}`}
        >
          <Link to="/" className="inline-flex min-h-tap items-center no-underline" aria-label={t('nav.homeLink')}>
            <BrandMark label={t('app.name')} />
          </Link>
          {focused ? null : (
            <>
              <nav aria-label={t('nav.main')} className="min-w-0">
                <ul className="flex flex-wrap items-center gap-tap-gap">
                  {(user
                    ? [...NAV_BY_ROLE[user.role], ...(user.role === 'driver' && user.isStudent ? STUDENT_NAV : [])]
                    : []
                  ).map((item) => (
                    <li key={item.key}>
                      <NavLink to={item.to} end className={navLinkClass}>
                        {t(`nav.${item.key}`)}
                      </NavLink>
                    </li>
                  ))}
                  <li>
                    <NavLink to="/settings" className={navLinkClass} data-testid="settings-link">
                      {t('nav.settings')}
                    </NavLink>
                  </li>
                  {user ? null : (
                    <li>
                      <NavLink to={SIGN_IN_PATH} className={navLinkClass}>
                        {t('nav.signIn')}
                      </NavLink>
                    </li>
                  )}
                </ul>
              </nav>
              {user ? <UserMenu user={user} /> : null}
            </>
          )}
        </div>
      </header>
      <main
        id="main"
        tabIndex={-1}
        className={`mx-auto w-full max-w-6xl flex-1 px-3 focus:outline-none ${focused ? 'py-2' : 'py-6'}`}
      >
        <Suspense fallback={<Loading label={t('common.loading')} />}>
          <Outlet />
        </Suspense>
      </main>
      {focused ? null : (
        <footer className="border-t-2 border-line px-3 py-4 text-center text-muted">{t('app.footer')}</footer>
      )}
    </div>
  );
}
