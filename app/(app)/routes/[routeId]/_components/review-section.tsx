'use client';

import { useState } from 'react';
import type { EnergyUnit } from '@/components/ladder/energy-format';
import { Tabs } from '@/components/ui/tabs';
import { HistoryPanel } from './history-panel';

type ReviewTab = 'history';

// Below the ladder: the route's review work.
export function ReviewSection({ routeId, canEdit, unit }: { routeId: number; canEdit: boolean; unit: EnergyUnit }) {
  const [tab, setTab] = useState<ReviewTab>('history');
  return (
    <section aria-label="Review" className="rounded-lg border border-paper-edge bg-white p-3">
      <Tabs label="Review" items={[{ key: 'history', label: 'History' }]} active={tab} onChange={setTab}>
        {tab === 'history' ? <HistoryPanel routeId={routeId} canEdit={canEdit} unit={unit} /> : null}
      </Tabs>
    </section>
  );
}
