'use client';

import { createColumnHelper, getCoreRowModel, useReactTable } from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import type { ComparedRoute, Comparison, MetricKey } from '@/lib/compare/compare-types';
import { METRIC_ROWS, type MetricRow } from '@/lib/compare/metric-rows';
import { metricSortValue, metricText, metricUnit, type MetricUnits } from './metric-format';
import { MetricGrid, MetricLabel, MetricValue } from './metric-grid';

type SortState = { key: MetricKey; dir: 'asc' | 'desc' } | null;

const helper = createColumnHelper<MetricRow>();

function orderRoutes(routes: readonly ComparedRoute[], sort: SortState): ComparedRoute[] {
  if (!sort) return [...routes];
  const sign = sort.dir === 'asc' ? 1 : -1;
  return [...routes].sort((a, b) => {
    const va = metricSortValue(sort.key, a.metrics);
    const vb = metricSortValue(sort.key, b.metrics);
    if (va === null || vb === null) return va === vb ? 0 : va === null ? 1 : -1;
    return (typeof va === 'number' && typeof vb === 'number' ? va - vb : String(va).localeCompare(String(vb))) * sign;
  });
}

// One column per route, one row per metric. The best value of a row is marked in words as well as
// tint; a row's sort button orders the routes by it; the reader picks which rows show.
export function MetricsTable({ comparison, units, visible, caption }: { comparison: Comparison; units: MetricUnits; visible: ReadonlySet<MetricKey>; caption: string }) {
  const [sort, setSort] = useState<SortState>(null);
  const routes = useMemo(() => orderRoutes(comparison.routes, sort), [comparison.routes, sort]);
  const rows = useMemo(() => METRIC_ROWS.filter((r) => visible.has(r.key)), [visible]);

  const columns = useMemo(
    () => [
      helper.display({
        id: 'metric',
        header: () => 'Metric',
        cell: ({ row }) => {
          const r = row.original;
          const active = sort?.key === r.key;
          const next: SortState = !active ? { key: r.key, dir: 'asc' } : sort.dir === 'asc' ? { key: r.key, dir: 'desc' } : null;
          return (
            <div className="flex items-start justify-between gap-2">
              <MetricLabel row={r} unit={metricUnit(r.key, units)} />
              <button
                type="button"
                className="shrink-0 rounded border border-paper-edge px-1 text-xs text-ink-soft hover:bg-paper-deep print:hidden"
                aria-label={`Order routes by ${r.label}${active ? (sort.dir === 'asc' ? ', now ascending' : ', now descending') : ''}`}
                onClick={() => setSort(next)}
              >
                {active ? (sort.dir === 'asc' ? '▲' : '▼') : '⇅'}
              </button>
            </div>
          );
        },
      }),
      ...routes.map((route) =>
        helper.display({
          id: `route-${route.id}`,
          header: () => route.name,
          cell: ({ row }) => {
            const key = row.original.key;
            const isBest = row.original.best !== 'none' && (comparison.best[key] ?? []).includes(route.id);
            return <MetricValue text={metricText(key, route.metrics, units)} isBest={isBest} unit={metricUnit(key, units)} />;
          },
        }),
      ),
    ],
    [routes, comparison.best, units, sort],
  );

  const table = useReactTable({ data: rows, columns, getCoreRowModel: getCoreRowModel(), getRowId: (r) => r.key });

  return <MetricGrid table={table} caption={caption} compact />;
}
