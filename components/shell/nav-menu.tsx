'use client';

import Link from 'next/link';
import { usePathname } from 'next/navigation';
import { useEffect, useId, useRef, useState, type KeyboardEvent } from 'react';
import type { ProfileDto } from '@/lib/services/users/get-profile';
import { TeamSwitcher } from './team-switcher';
import { AccountPanel } from './user-menu';

export interface NavItem {
  href: string;
  label: string;
}

export const isActivePath = (pathname: string, href: string) => pathname === href || pathname.startsWith(`${href}/`);

/**
 * The navigation below `lg`: a disclosure button that opens the sections, the team switcher and the account as a
 * sheet under the header. Focus stays on the button when it opens (the sheet follows it in tab order); Escape,
 * a click outside, tabbing out of it or following a link closes it, and Escape puts focus back on the button.
 */
export function NavMenu({ items, profile }: { items: readonly NavItem[]; profile: ProfileDto }) {
  const [isOpen, setOpen] = useState(false);
  const pathname = usePathname();
  const panelId = useId();
  const root = useRef<HTMLDivElement>(null);
  const button = useRef<HTMLButtonElement>(null);

  // A followed link (or any navigation) closes the sheet; adjusting state during render avoids an effect.
  const [openedOn, setOpenedOn] = useState(pathname);
  if (openedOn !== pathname) {
    setOpenedOn(pathname);
    setOpen(false);
  }

  useEffect(() => {
    if (!isOpen) return;
    const onPointerDown = (event: PointerEvent) => {
      if (root.current && !root.current.contains(event.target as Node)) setOpen(false);
    };
    document.addEventListener('pointerdown', onPointerDown);
    return () => document.removeEventListener('pointerdown', onPointerDown);
  }, [isOpen]);

  const onKeyDown = (event: KeyboardEvent) => {
    if (event.key !== 'Escape' || !isOpen) return;
    event.stopPropagation();
    setOpen(false);
    button.current?.focus();
  };

  return (
    <div
      ref={root}
      className="lg:hidden"
      onKeyDown={onKeyDown}
      onBlur={(event) => {
        // Tabbing past the last entry leaves the sheet: close it rather than leave it over the page.
        if (isOpen && event.relatedTarget && !event.currentTarget.contains(event.relatedTarget as Node)) setOpen(false);
      }}
    >
      <button
        ref={button}
        type="button"
        aria-expanded={isOpen}
        aria-controls={panelId}
        onClick={() => setOpen((open) => !open)}
        className="inline-flex items-center gap-1.5 rounded-md border border-paper-edge px-2.5 py-1.5 text-sm font-medium hover:bg-paper"
      >
        <span aria-hidden="true" className="text-base leading-none">
          {isOpen ? '✕' : '☰'}
        </span>
        Menu
      </button>
      {/* The contents exist only while open, so the desktop header's switcher and links are the only ones otherwise. */}
      <div id={panelId} hidden={!isOpen} className="absolute inset-x-0 top-full z-40 max-h-[calc(100dvh-3.5rem)] overflow-y-auto border-b border-paper-edge bg-white shadow-lg">
        {isOpen ? (
          <div className="mx-auto flex max-w-7xl flex-col gap-4 px-4 py-3">
            <nav aria-label="Main">
              <ul className="flex flex-col">
                {items.map((item) => {
                  const active = isActivePath(pathname, item.href);
                  return (
                    <li key={item.href}>
                      <Link
                        href={item.href}
                        aria-current={active ? 'page' : undefined}
                        onClick={() => setOpen(false)}
                        className={`block rounded-md px-3 py-2.5 text-base ${active ? 'bg-pine-50 font-semibold text-pine-700' : 'text-ink hover:bg-paper'}`}
                      >
                        {item.label}
                      </Link>
                    </li>
                  );
                })}
              </ul>
            </nav>
            {profile.memberships.length ? (
              <div className="border-t border-paper-edge pt-3">
                <TeamSwitcher profile={profile} isLabelShown />
              </div>
            ) : null}
            <div className="border-t border-paper-edge pt-3">
              <AccountPanel name={profile.user.name} email={profile.user.email} />
            </div>
          </div>
        ) : null}
      </div>
    </div>
  );
}
