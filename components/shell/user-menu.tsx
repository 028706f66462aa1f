'use client';

import { signOut } from 'next-auth/react';
import Link from 'next/link';

function signOutNow() {
  void signOut({ callbackUrl: '/sign-in' });
}

/** Who is signed in and the way out, flat: inside the phone and tablet menu, where Settings is a section already. */
export function AccountPanel({ name, email }: { name: string; email: string }) {
  return (
    <div className="flex items-center gap-3 text-sm">
      <span aria-hidden="true" className="inline-flex h-8 w-8 shrink-0 items-center justify-center rounded-full bg-pine-600 text-xs font-semibold text-white">
        {initials(name)}
      </span>
      <div className="min-w-0 flex-1">
        <p className="truncate font-medium">{name}</p>
        <p className="truncate text-xs text-ink-faint">{email}</p>
      </div>
      <button type="button" onClick={signOutNow} className="shrink-0 rounded-md border border-paper-edge px-2.5 py-1.5 hover:bg-paper">
        Sign out
      </button>
    </div>
  );
}

export function UserMenu({ name, email }: { name: string; email: string }) {
  return (
    <details className="relative">
      <summary className="cursor-pointer list-none rounded-md px-2 py-1 text-sm hover:bg-paper" aria-label={`Account menu for ${name}`}>
        <span aria-hidden="true" className="inline-flex h-7 w-7 items-center justify-center rounded-full bg-pine-600 text-xs font-semibold text-white">
          {initials(name)}
        </span>
      </summary>
      <div className="absolute right-0 z-20 mt-1 w-56 rounded-md border border-paper-edge bg-white p-2 text-sm shadow-lg">
        <p className="font-medium">{name}</p>
        <p className="truncate text-xs text-ink-faint">{email}</p>
        <hr className="my-2 border-paper-edge" />
        <Link href="/settings" className="block rounded px-2 py-1 hover:bg-paper">
          Settings
        </Link>
        <button type="button" onClick={signOutNow} className="block w-full rounded px-2 py-1 text-left hover:bg-paper">
          Sign out
        </button>
      </div>
    </details>
  );
}

function initials(name: string): string {
  return name
    .split(/\s+/)
    .filter(Boolean)
    .slice(0, 2)
    .map((p) => p[0]?.toUpperCase())
    .join('');
}
