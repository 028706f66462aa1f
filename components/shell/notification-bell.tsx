'use client';

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useRouter } from 'next/navigation';
import { useRef } from 'react';
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

  return (
    <details ref={details} className="relative">
      <summary className="relative cursor-pointer list-none rounded-md px-2 py-1 text-sm hover:bg-paper" aria-label={unread ? `Notifications, ${unread} unread` : 'Notifications'}>
        <span aria-hidden="true">Inbox</span>
        {unread ? (
          <span aria-hidden="true" className="ml-1 inline-flex min-w-5 items-center justify-center rounded-full bg-brass-500 px-1 text-xs font-semibold text-white" data-testid="unread-count">
            {unread > 99 ? '99+' : unread}
          </span>
        ) : null}
      </summary>
      <div className="absolute right-0 z-30 mt-1 flex max-h-[28rem] w-80 flex-col overflow-hidden rounded-md border border-paper-edge bg-white text-sm shadow-lg">
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
                    {n.title}
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
