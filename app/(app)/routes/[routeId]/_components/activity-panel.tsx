'use client';

import { useInfiniteQuery } from '@tanstack/react-query';
import { ChemText } from '@/components/chemistry/chem-text';
import { Button } from '@/components/ui/button';
import { When } from '@/components/ui/when';
import { apiFetch } from '@/lib/queries/api-fetch';
import { discussionKeys } from '@/lib/queries/comments';
import type { ActivityItem, ActivityPageDto } from '@/lib/schemas/activity';
import { ROUTE_STATUS_LABELS } from '@/lib/schemas/workflow';

function describe(item: ActivityItem, stepName: (key: string) => string): string {
  const where = item.stepKey ? ` on ${stepName(item.stepKey)}` : '';
  switch (item.kind) {
    case 'revision':
      return `saved revision ${item.version}: ${item.summary}`;
    case 'transition':
      return `moved the route ${ROUTE_STATUS_LABELS[item.from]} → ${ROUTE_STATUS_LABELS[item.to]}${item.reviewers.length ? `, reviewers ${item.reviewers.map((r) => r.name).join(', ')}` : ''}${item.note ? `: “${item.note}”` : ''}`;
    case 'comment':
      return item.isDeleted ? `wrote a comment${where} (since deleted)` : `${item.isReply ? 'replied' : 'commented'}${where}: ${item.text}`;
    case 'thread_resolved':
      return `resolved a thread${where}`;
    case 'thread_reopened':
      return `reopened a thread${where}`;
    case 'flag_raised':
      return `flagged${where} (${item.category}): ${item.reason}`;
    case 'flag_cleared':
      return `cleared the ${item.category} flag${where}`;
  }
}

// Everything that happened to the route, newest first: saves, moves, comments and flags.
export function ActivityPanel({ routeId, stepLabels }: { routeId: number; stepLabels: Record<string, string> }) {
  const query = useInfiniteQuery({
    queryKey: discussionKeys.activity(routeId),
    queryFn: ({ pageParam }) => apiFetch<ActivityPageDto>(`/api/routes/${routeId}/activity?limit=30${pageParam ? `&before=${encodeURIComponent(pageParam)}` : ''}`),
    initialPageParam: '',
    getNextPageParam: (last) => last.nextBefore ?? undefined,
  });
  // A thread or flag may outlive its step; its id means nothing to a reader.
  const stepName = (key: string) => stepLabels[key] ?? 'a removed step';
  if (query.isPending) return <p className="text-sm text-ink-faint">Loading activity…</p>;
  if (query.isError) return <p role="alert" className="text-sm text-uphill">Could not load activity: {query.error.message}</p>;
  const items = query.data.pages.flatMap((p) => p.items);
  if (items.length === 0) return <p className="text-sm text-ink-faint">Nothing has happened to this route yet.</p>;
  return (
    <div className="flex flex-col gap-2">
      <ol className="flex flex-col divide-y divide-paper-deep" aria-label="Activity, newest first">
        {items.map((item) => (
          <li key={item.id} className="py-1.5 text-sm">
            <span className="font-medium">{item.actor?.name ?? 'Former member'}</span> <ChemText text={describe(item, stepName)} />
            <span className="ml-2">
              <When iso={item.at} />
            </span>
          </li>
        ))}
      </ol>
      {query.hasNextPage ? (
        <div>
          <Button variant="secondary" disabled={query.isFetchingNextPage} onClick={() => void query.fetchNextPage()}>
            {query.isFetchingNextPage ? 'Loading…' : 'Older activity'}
          </Button>
        </div>
      ) : null}
    </div>
  );
}
