'use client';

import { createColumnHelper, getCoreRowModel, useReactTable } from '@tanstack/react-table';
import { useMemo } from 'react';
import { metricText, metricUnit, type MetricUnits } from '@/components/compare/metric-format';
import { MetricGrid, MetricLabel, MetricValue } from '@/components/compare/metric-grid';
import { formatTemperatureChange, type TemperatureUnit } from '@/components/ladder/energy-format';
import type { ComparisonSnapshot } from '@/lib/compare/compare-types';
import { ScrollRegion } from '@/components/tables/scroll-region';
import { METRIC_ROWS, type MetricRow } from '@/lib/compare/metric-rows';
import type { WhatIf } from '@/lib/schemas/compare';

/** The conditions the comparison was run at, in words. */
export function whatIfText(whatIf: WhatIf, unit: TemperatureUnit): string {
  const parts: string[] = [];
  if (whatIf.temperatureOffset_K) parts.push(`every step ${formatTemperatureChange(whatIf.temperatureOffset_K, unit)} from its saved temperature`);
  if (whatIf.standardPressure) parts.push(`standard pressure ${whatIf.standardPressure}`);
  return parts.length ? `What-if: ${parts.join('; ')}.` : 'At the routes’ saved conditions (no what-if).';
}

const helper = createColumnHelper<MetricRow>();

// The metrics as they stood when the decision was made: one column per route, best values marked in words too.
export function SnapshotMetrics({ snapshot, units, chosenRouteId }: { snapshot: ComparisonSnapshot; units: MetricUnits; chosenRouteId: number | null }) {
  const columns = useMemo(
    () => [
      helper.display({
        id: 'metric',
        header: () => 'Metric',
        cell: ({ row }) => <MetricLabel row={row.original} unit={metricUnit(row.original.key, units)} />,
      }),
      ...snapshot.routes.map((route) =>
        helper.display({
          id: `route-${route.id}`,
          header: () => (
            <span>
              {route.name}
              {route.id === chosenRouteId ? <span className="ml-1 rounded bg-pine-50 px-1 text-[11px] font-medium normal-case text-pine-700">chosen</span> : null}
            </span>
          ),
          cell: ({ row }) => {
            const { key, best } = row.original;
            const isBest = best !== 'none' && (snapshot.best[key] ?? []).includes(route.id);
            return <MetricValue text={metricText(key, route.metrics, units)} isBest={isBest} unit={metricUnit(key, units)} />;
          },
        }),
      ),
    ],
    [snapshot, units, chosenRouteId],
  );
  const table = useReactTable({ data: METRIC_ROWS as MetricRow[], columns, getCoreRowModel: getCoreRowModel(), getRowId: (r) => r.key });

  return (
    <ScrollRegion label="Metrics of the compared routes when the decision was made" className="rounded-lg border border-paper-edge bg-white">
      <MetricGrid table={table} caption="Metrics of the compared routes when the decision was made" headClassName="bg-paper-deep text-xs text-ink-soft" />
      <p className="border-t border-paper-edge px-3 py-2 text-xs text-ink-faint">
        “best” marks the best value of a row as the comparison ranked it; rows without a ranking (temperature span, last edit, edited by) mark none.
      </p>
    </ScrollRegion>
  );
}
