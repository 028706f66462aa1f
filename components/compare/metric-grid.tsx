'use client';

import { flexRender, type Table } from '@tanstack/react-table';
import type { MetricRow } from '@/lib/compare/metric-rows';

/** A metric's name (with its unit, stated once for the row) and its basis beneath, for the first column of a metrics table. */
export function MetricLabel({ row, unit }: { row: MetricRow; unit?: string | null }) {
  return (
    <span>
      <span className="font-medium">{unit ? `${row.label} (${unit})` : row.label}</span>
      {row.basis ? <span className="block text-xs text-ink-faint">{row.basis}</span> : null}
    </span>
  );
}

/** One route's value of a metric; the best is marked in words as well as tint. A screen reader hears the unit with the number. */
export function MetricValue({ text, isBest, unit }: { text: string; isBest: boolean; unit?: string | null }) {
  const hasNumber = unit && /\d/.test(text);
  return (
    <span className={`relative ${isBest ? 'font-semibold text-downhill' : ''}`}>
      {text}
      {hasNumber ? <span className="sr-only"> {unit}</span> : null}
      {isBest ? <span className="ml-1 rounded bg-downhill-bg px-1 text-[11px]">best</span> : null}
    </span>
  );
}

// One column per route, one row per metric, the metric cell a row header so screen readers name each value.
export function MetricGrid({ table, caption, compact = false, headClassName = '' }: { table: Table<MetricRow>; caption: string; compact?: boolean; headClassName?: string }) {
  const pad = compact ? 'px-2 py-1.5' : 'px-3 py-2';
  return (
    <table className="w-full border-collapse text-left text-sm">
      <caption className="sr-only">{caption}</caption>
      <thead className={headClassName}>
        {table.getHeaderGroups().map((group) => (
          <tr key={group.id} className={compact ? 'border-b border-paper-edge' : undefined}>
            {group.headers.map((header) => (
              <th key={header.id} scope="col" className={`${pad} align-bottom font-semibold`}>
                {flexRender(header.column.columnDef.header, header.getContext())}
              </th>
            ))}
          </tr>
        ))}
      </thead>
      <tbody>
        {table.getRowModel().rows.map((row) => (
          <tr key={row.id} className={compact ? 'border-b border-paper-deep align-top' : 'border-t border-paper-edge align-top'} data-metric={row.id}>
            {row.getVisibleCells().map((cell, i) =>
              i === 0 ? (
                <th key={cell.id} scope="row" className={`w-64 ${pad} text-left font-normal`}>
                  {flexRender(cell.column.columnDef.cell, cell.getContext())}
                </th>
              ) : (
                <td key={cell.id} className={`${pad} tabular-nums`}>
                  {flexRender(cell.column.columnDef.cell, cell.getContext())}
                </td>
              ),
            )}
          </tr>
        ))}
      </tbody>
    </table>
  );
}
