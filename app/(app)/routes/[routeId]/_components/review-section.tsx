'use client';

import { useState } from 'react';
import type { EnergyUnit } from '@/components/ladder/energy-format';
import { Tabs } from '@/components/ui/tabs';
import { can } from '@/lib/auth/permissions';
import type { Role } from '@/lib/auth/roles';
import { ActivityPanel } from './activity-panel';
import { DiscussionPanel } from './discussion-panel';
import { FlagsPanel } from './flags-panel';
import { HistoryPanel } from './history-panel';
import type { useReviewData } from './use-review-data';

type ReviewTab = 'discussion' | 'flags' | 'history' | 'activity';

// Below the ladder: the route's review work.
export function ReviewSection({
  routeId,
  selfId,
  role,
  canEdit,
  unit,
  stepLabels,
  data,
}: {
  routeId: number;
  selfId: number;
  role: Role;
  canEdit: boolean;
  unit: EnergyUnit;
  stepLabels: Record<string, string>;
  data: ReturnType<typeof useReviewData>;
}) {
  const [tab, setTab] = useState<ReviewTab>('discussion');
  const openThreads = data.comments.data?.threads.filter((t) => !t.resolved).length;
  const openFlags = data.flags.data?.flags.length;
  const count = (n: number | undefined) => (n ? ` (${n})` : '');
  return (
    <section aria-label="Review" className="rounded-lg border border-paper-edge bg-white p-3">
      <Tabs
        label="Review"
        items={[
          { key: 'discussion', label: `Discussion${count(openThreads)}` },
          { key: 'flags', label: `Flags${count(openFlags)}` },
          { key: 'history', label: 'History' },
          { key: 'activity', label: 'Activity' },
        ]}
        active={tab}
        onChange={setTab}
      >
        {tab === 'discussion' ? (
          <DiscussionPanel
            routeId={routeId}
            selfId={selfId}
            canComment={can(role, 'route.comment')}
            comments={data.comments}
            handles={data.handles}
            stepLabels={stepLabels}
            refresh={data.refresh}
          />
        ) : null}
        {tab === 'flags' ? <FlagsPanel routeId={routeId} canFlag={can(role, 'route.flag')} stepLabels={stepLabels} refresh={data.refresh} /> : null}
        {tab === 'history' ? <HistoryPanel routeId={routeId} canEdit={canEdit} unit={unit} /> : null}
        {tab === 'activity' ? <ActivityPanel routeId={routeId} stepLabels={stepLabels} /> : null}
      </Tabs>
    </section>
  );
}
