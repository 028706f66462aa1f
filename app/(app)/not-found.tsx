'use client';

import Link from 'next/link';
import { usePathname } from 'next/navigation';

// What was being looked for, from the address, so the message can name it and offer the right list.
function lookedFor(pathname: string): { what: string; list: { href: string; label: string } } {
  if (pathname.startsWith('/routes/')) return { what: 'route', list: { href: '/routes', label: 'All routes' } };
  if (pathname.startsWith('/decisions/')) return { what: 'decision', list: { href: '/decisions', label: 'The decision log' } };
  if (pathname.startsWith('/species/')) return { what: 'species', list: { href: '/species', label: 'All species' } };
  if (pathname.startsWith('/fits/')) return { what: 'data fit', list: { href: '/fits', label: 'All data fits' } };
  return { what: 'page', list: { href: '/routes', label: 'All routes' } };
}

// A 404 inside the signed-in shell: the navigation stays, and the message says what may have happened.
export default function SignedInNotFound() {
  const { what, list } = lookedFor(usePathname());
  return (
    <section aria-labelledby="not-found-title" className="mx-auto flex max-w-xl flex-col gap-3 py-10" data-testid="in-app-not-found">
      <h1 id="not-found-title" className="text-xl font-semibold">
        There is no such {what} here
      </h1>
      <p className="text-sm text-ink-soft">
        The address may be mistyped, the {what} may have been deleted, or it may belong to a team you are not in. If you have several teams, switch team from
        the menu at the top and try the link again.
      </p>
      <ul className="flex flex-wrap gap-2 text-sm">
        <li>
          <Link href={list.href} className="inline-block rounded-md border border-paper-edge bg-white px-3 py-1.5 font-medium hover:bg-paper-deep">
            {list.label}
          </Link>
        </li>
        {[
          { href: '/routes', label: 'Routes' },
          { href: '/decisions', label: 'Decisions' },
        ]
          .filter((l) => l.href !== list.href)
          .map((l) => (
            <li key={l.href}>
              <Link href={l.href} className="inline-block rounded-md px-3 py-1.5 text-pine-700 hover:bg-pine-50">
                {l.label}
              </Link>
            </li>
          ))}
      </ul>
    </section>
  );
}
