'use client';

import { useQuery } from '@tanstack/react-query';
import Link from 'next/link';
import { useState } from 'react';
import type { LadderBasis } from '@/components/compare/compare-ladder';
import { metricsCsv } from '@/components/compare/metrics-csv';
import { compareStepsCsv } from '@/components/compare/steps-csv';
import { csvBlob, downloadBlob } from '@/components/ladder/ladder-export';
import { SafetyCaution } from '@/components/safety/safety-caution';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { can } from '@/lib/auth/permissions';
import { METRIC_ROWS } from '@/lib/compare/metric-rows';
import type { MetricKey } from '@/lib/compare/compare-types';
import { ApiError } from '@/lib/queries/api-fetch';
import { compareQuery } from '@/lib/queries/compare';
import { activeMembership, useProfile } from '@/lib/queries/me';
import type { WhatIf } from '@/lib/schemas/compare';
import { CompareView } from './compare-view';
import { RecordDecision } from './decision-form';
import { TargetWarning } from './target-warning';
import { WhatIfForm } from './what-if-form';

// The server's field messages say what is wrong with the ids or the what-if; its headline only that something is.
function errorText(error: Error): string {
  const fields = error instanceof ApiError ? Object.values(error.fields ?? {}) : [];
  return fields.length ? fields.join(' ') : error.message;
}

function reportHref(ids: readonly number[], whatIf: WhatIf, basis: LadderBasis): string {
  const params = new URLSearchParams({ ids: ids.join(','), basis });
  if (whatIf.temperatureOffset_K) params.set('temperatureOffset_K', String(whatIf.temperatureOffset_K));
  if (whatIf.standardPressure) params.set('standardPressure', whatIf.standardPressure);
  return `/routes/compare/report?${params.toString()}`;
}

export function CompareClient({ ids }: { ids: number[] }) {
  const { data: profile } = useProfile();
  const role = activeMembership(profile)?.role;
  const units = { energyUnit: profile?.preferences.energyUnit ?? 'kJ', temperatureUnit: profile?.preferences.temperatureUnit ?? 'K' } as const;
  const [whatIf, setWhatIf] = useState<WhatIf>({});
  const [basis, setBasis] = useState<LadderBasis>('conditions');
  const [visible, setVisible] = useState<Set<MetricKey>>(() => new Set(METRIC_ROWS.map((r) => r.key)));
  const query = useQuery(compareQuery(ids, whatIf));

  if (query.isPending) return <p className="text-sm text-ink-faint">Evaluating the routes…</p>;
  if (query.isError && !query.data) {
    return (
      <Notice tone="error" title="These routes cannot be compared">
        {errorText(query.error)} <Link href="/routes" className="underline">Back to the routes list</Link> to pick 2 to 4 routes of your team.
      </Notice>
    );
  }
  const comparison = query.data!;
  const toggleRow = (key: MetricKey) =>
    setVisible((v) => {
      const next = new Set(v);
      if (next.has(key)) next.delete(key);
      else next.add(key);
      return next;
    });

  return (
    <div className="flex flex-col gap-4">
      <TargetWarning routes={comparison.routes} />
      <SafetyCaution />
      <section aria-label="Comparison settings" className="flex flex-col gap-3 rounded-lg border border-paper-edge bg-white p-3">
        <WhatIfForm value={whatIf} busy={query.isFetching} onApply={setWhatIf} />
        {query.isError ? <Notice tone="error">{errorText(query.error)}</Notice> : null}
        {Object.keys(comparison.whatIf).length ? (
          <p className="text-sm text-marginal" role="status">
            What-if in force: {comparison.whatIf.temperatureOffset_K ? `every temperature ${comparison.whatIf.temperatureOffset_K > 0 ? '+' : ''}${comparison.whatIf.temperatureOffset_K} K` : ''}
            {comparison.whatIf.temperatureOffset_K && comparison.whatIf.standardPressure ? ', ' : ''}
            {comparison.whatIf.standardPressure ? `standard pressure ${comparison.whatIf.standardPressure}` : ''}. The saved routes are unchanged.
          </p>
        ) : null}
        <fieldset className="flex flex-wrap items-center gap-3 text-sm">
          <legend className="sr-only">Ladder values</legend>
          <label className="flex items-center gap-1">
            <input type="radio" name="basis" checked={basis === 'conditions'} onChange={() => setBasis('conditions')} /> ΔG at each step’s conditions
          </label>
          <label className="flex items-center gap-1">
            <input type="radio" name="basis" checked={basis === 'standard'} onChange={() => setBasis('standard')} /> Standard ΔG°
          </label>
        </fieldset>
        <details className="text-sm">
          <summary className="cursor-pointer">Rows shown ({visible.size} of {METRIC_ROWS.length})</summary>
          <div className="mt-1 grid gap-1 sm:grid-cols-2 lg:grid-cols-3">
            {METRIC_ROWS.map((r) => (
              <label key={r.key} className="flex items-center gap-1 text-xs">
                <input type="checkbox" checked={visible.has(r.key)} onChange={() => toggleRow(r.key)} /> {r.label}
                <span className="text-ink-faint">(best: {r.bestMeans})</span>
              </label>
            ))}
          </div>
        </details>
      </section>

      <CompareView comparison={comparison} basis={basis} units={units} visible={visible} />

      <section aria-label="Export" className="flex flex-wrap items-center gap-2">
        <Link href={reportHref(ids, comparison.whatIf, basis)} className="rounded-md border border-paper-edge bg-white px-3 py-1.5 text-sm font-medium hover:bg-paper-deep">
          Printable report
        </Link>
        <Button variant="secondary" onClick={() => downloadBlob(csvBlob(metricsCsv(comparison, units, visible)), 'stepwell-comparison.csv')}>
          Download CSV
        </Button>
        <Button variant="secondary" onClick={() => downloadBlob(csvBlob(compareStepsCsv(comparison)), 'stepwell-comparison-steps.csv')}>
          Download steps CSV (with data origins)
        </Button>
        {comparison.routes.map((r) => (
          <a key={r.id} href={`/api/routes/${r.id}/export`} className="text-sm text-pine-700 underline" download>
            {r.name} as route JSON
          </a>
        ))}
      </section>

      {can(role, 'route.decide') ? (
        <section aria-label="Decision" className="rounded-lg border border-paper-edge bg-white p-3">
          <h2 className="mb-2 text-base font-semibold">Record the decision</h2>
          <RecordDecision routes={comparison.routes} whatIf={comparison.whatIf} />
        </section>
      ) : (
        <p className="text-xs text-ink-faint">The group lead records which route the team goes on with; past decisions are in the decision log.</p>
      )}
    </div>
  );
}
