'use client';

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { useEffect, useRef, type KeyboardEvent } from 'react';
import { ChemText } from '@/components/chemistry/chem-text';
import { When } from '@/components/ui/when';
import { discussionKeys, markNotificationsRead, notificationsQuery } from '@/lib/queries/comments';
import type { NotificationDto } from '@/lib/schemas/notification';

// The in-app list of review requests, mentions, status changes and comments, with the unread count.
export function NotificationBell() {
  const query = useQuery(notificationsQuery());
  const queryClient = useQueryClient();
  const router = useRouter();
  const details = useRef<HTMLDetailsElement>(null);
  const markRead = useMutation({
    mutationFn: markNotificationsRead,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: discussionKeys.notifications }),
  });
  const unread = query.data?.unreadCount ?? 0;

  const open = (n: NotificationDto) => {
    if (!n.isRead) markRead.mutate({ ids: [n.id] });
    if (details.current) details.current.open = false;
    router.push(n.link);
  };

  // A tap elsewhere closes it, as the menu beside it does; on a phone the open list covers the page.
  useEffect(() => {
    const onPointerDown = (event: PointerEvent) => {
      const el = details.current;
      if (el?.open && !el.contains(event.target as Node)) el.open = false;
    };
    document.addEventListener('pointerdown', onPointerDown);
    return () => document.removeEventListener('pointerdown', onPointerDown);
  }, []);

  const closeOnEscape = (event: KeyboardEvent<HTMLDetailsElement>) => {
    if (event.key !== 'Escape' || !details.current?.open) return;
    details.current.open = false;
    details.current.querySelector('summary')?.focus();
  };

  // Below lg the list opens as a sheet under the header (its containing block), as wide as the screen.
  return (
    <details ref={details} className="lg:relative" onKeyDown={closeOnEscape}>
      <summary className="relative cursor-pointer list-none rounded-md px-2 py-1 text-sm hover:bg-paper" aria-label={unread ? `Notifications, ${unread} unread` : 'Notifications'}>
        <span aria-hidden="true">Inbox</span>
        {unread ? (
          <span aria-hidden="true" className="ml-1 inline-flex min-w-5 items-center justify-center rounded-full bg-brass-500 px-1 text-xs font-semibold text-white" data-testid="unread-count">
            {unread > 99 ? '99+' : unread}
          </span>
        ) : null}
      </summary>
      <div className="absolute inset-x-2 top-full z-30 mt-1 flex max-h-[28rem] flex-col overflow-hidden rounded-md border border-paper-edge bg-white text-sm shadow-lg lg:inset-x-auto lg:right-0 lg:top-auto lg:w-80">
        <div className="flex items-center justify-between border-b border-paper-edge px-3 py-2">
          <p className="font-medium">Notifications</p>
          <button type="button" className="text-xs text-pine-700 hover:underline disabled:text-ink-faint" disabled={!unread || markRead.isPending} onClick={() => markRead.mutate({ all: true })}>
            Mark all read
          </button>
        </div>
        <div className="overflow-y-auto">
          {query.isPending ? <p className="px-3 py-2 text-ink-faint">Loading…</p> : null}
          {query.isError ? <p className="px-3 py-2 text-uphill">Could not load notifications.</p> : null}
          {query.data && query.data.items.length === 0 ? <p className="px-3 py-2 text-ink-faint">Nothing yet. Review requests, mentions and status changes appear here.</p> : null}
          <ul>
            {query.data?.items.map((n) => (
              <li key={n.id} className="border-b border-paper-deep last:border-0">
                <button type="button" onClick={() => open(n)} className={`flex w-full flex-col gap-0.5 px-3 py-2 text-left hover:bg-paper ${n.isRead ? 'text-ink-soft' : ''}`}>
                  <span className={n.isRead ? '' : 'font-semibold'}>
                    {n.isRead ? null : <span className="sr-only">Unread: </span>}
                    <ChemText text={n.title} />
                  </span>
                  {n.text ? <span className="line-clamp-2 text-xs text-ink-soft">{n.text}</span> : null}
                  <When iso={n.createdAt} />
                </button>
              </li>
            ))}
          </ul>
        </div>
      </div>
    </details>
  );
}
