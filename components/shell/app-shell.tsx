'use client';

import Link from 'next/link';
import { usePathname } from 'next/navigation';
import type { ReactNode } from 'react';
import { useProfile } from '@/lib/queries/me';
import type { ProfileDto } from '@/lib/services/users/get-profile';
import { NavMenu } from './nav-menu';
import { NotificationBell } from './notification-bell';
import { StepwellMark } from './stepwell-mark';
import { TeamSwitcher } from './team-switcher';
import { UserMenu } from './user-menu';

const NAV = [
  { href: '/routes', label: 'Routes' },
  { href: '/decisions', label: 'Decisions' },
  { href: '/species', label: 'Species' },
  { href: '/fits', label: 'Data fits' },
  { href: '/team', label: 'Team' },
  { href: '/settings', label: 'Settings' },
] as const;

export function AppShell({ profile: initial, children }: { profile: ProfileDto; children: ReactNode }) {
  const { data: profile = initial } = useProfile(initial);
  const pathname = usePathname();
  return (
    <div className="flex min-h-screen flex-col">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:rounded focus:bg-white focus:px-2 focus:py-1">
        Skip to content
      </a>
      {/* relative: the phone menu and the inbox open as sheets under it, as wide as the screen */}
      <header className="relative border-b border-paper-edge bg-white print:hidden">
        <div className="mx-auto flex max-w-7xl items-center gap-4 px-4 py-2">
          <Link href="/routes" className="flex items-center gap-2 font-semibold">
            <StepwellMark /> <span>Stepwell</span>
          </Link>
          <nav aria-label="Main" className="hidden flex-1 flex-wrap gap-1 lg:flex">
            {NAV.map((item) => {
              const active = pathname === item.href || pathname.startsWith(`${item.href}/`);
              return (
                <Link
                  key={item.href}
                  href={item.href}
                  aria-current={active ? 'page' : undefined}
                  className={`rounded-md px-2.5 py-1.5 text-sm ${active ? 'bg-pine-50 font-semibold text-pine-700' : 'text-ink-soft hover:bg-paper'}`}
                >
                  {item.label}
                </Link>
              );
            })}
          </nav>
          {/* Below lg the sections, the team and the account move into the Menu; the inbox stays in the bar. */}
          <div className="flex-1 lg:hidden" />
          <div className="hidden lg:block">
            <TeamSwitcher profile={profile} />
          </div>
          {profile.memberships.length ? <NotificationBell /> : null}
          <div className="hidden lg:block">
            <UserMenu name={profile.user.name} email={profile.user.email} />
          </div>
          <NavMenu items={NAV} profile={profile} />
        </div>
      </header>
      <main id="main" className="mx-auto w-full max-w-7xl flex-1 px-4 py-6">
        {profile.memberships.length === 0 ? (
          <p className="text-sm text-ink-soft">You are not a member of any team yet. Ask a team lead for an invitation, or start a new team.</p>
        ) : (
          children
        )}
      </main>
    </div>
  );
}
