'use client';

import { useQuery } from '@tanstack/react-query';
import { useMemo } from 'react';
import type { LadderBasis } from '@/components/compare/compare-ladder';
import { SafetyCaution } from '@/components/safety/safety-caution';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { formatWhen } from '@/components/ui/when';
import { METRIC_ROWS } from '@/lib/compare/metric-rows';
import { compareQuery } from '@/lib/queries/compare';
import { latestDecisionQuery } from '@/lib/queries/decision-for-routes';
import { useProfile } from '@/lib/queries/me';
import type { WhatIf } from '@/lib/schemas/compare';
import { CompareView } from '../compare-view';
import { TargetWarning } from '../target-warning';

// A page made for paper: the browser's print dialog saves it as PDF. Controls hide in print.
export function ReportClient({ ids, whatIf, basis }: { ids: number[]; whatIf: WhatIf; basis: LadderBasis }) {
  const { data: profile } = useProfile();
  const units = { energyUnit: profile?.preferences.energyUnit ?? 'kJ', temperatureUnit: profile?.preferences.temperatureUnit ?? 'K' } as const;
  const query = useQuery(compareQuery(ids, whatIf));
  const decision = useQuery(latestDecisionQuery(ids));
  const visible = useMemo(() => new Set(METRIC_ROWS.map((r) => r.key)), []);
  if (query.isPending) return <p className="text-sm text-ink-faint">Evaluating the routes…</p>;
  if (query.isError) return <Notice tone="error" title="These routes cannot be compared">{query.error.message}</Notice>;
  const c = query.data;
  const what = [c.whatIf.temperatureOffset_K ? `every temperature ${c.whatIf.temperatureOffset_K > 0 ? '+' : ''}${c.whatIf.temperatureOffset_K} K` : '', c.whatIf.standardPressure ? `standard pressure ${c.whatIf.standardPressure}` : '']
    .filter(Boolean)
    .join(', ');
  return (
    <article className="report flex flex-col gap-4">
      <header className="flex flex-wrap items-start justify-between gap-2">
        <div>
          <h1 className="text-xl font-semibold">Route comparison</h1>
          <p className="text-sm text-ink-soft">
            {c.routes.map((r) => r.name).join(' · ')} — {basis === 'conditions' ? 'ΔG at each step’s conditions' : 'standard ΔG°'}, {units.energyUnit} per mol of target
            {what ? `; what-if: ${what} (saved routes unchanged)` : ''}. Printed {formatWhen(new Date().toISOString())}.
          </p>
        </div>
        <Button className="print:hidden" onClick={() => window.print()}>
          Print or save as PDF
        </Button>
      </header>
      <TargetWarning routes={c.routes} />
      <CompareView comparison={c} basis={basis} units={units} visible={visible} isPrint />
      <section aria-label="Decision" className="break-inside-avoid rounded-lg border border-paper-edge bg-white p-3">
        <h2 className="text-base font-semibold">Decision</h2>
        {decision.data ? (
          <p className="text-sm">
            #{decision.data.id}, {formatWhen(decision.data.createdAt)} by {decision.data.author?.name ?? 'a former member'}: go on with <strong>{decision.data.chosen?.name ?? 'a deleted route'}</strong>.{' '}
            {decision.data.rationale}
          </p>
        ) : (
          <p className="text-sm text-ink-soft">No decision recorded for these routes yet.</p>
        )}
      </section>
      <SafetyCaution always />
      <p className="text-xs text-ink-faint">{c.caution}</p>
    </article>
  );
}
