// One unit for route totals, stated once (issue 19): the comparison names the energy unit beside each energy row
// and its cells hold bare numbers with the true minus; a screen reader still hears the unit with each number.
// The figure: C(graphite) + O2(g) -> CO2(g), ΔfG°(CO2, g) = −394.359 kJ/mol at 298.15 K (NBS Tables 1982, from memory).
import { createColumnHelper, getCoreRowModel, useReactTable } from '@tanstack/react-table';
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { metricText, metricUnit } from '@/components/compare/metric-format';
import { MetricGrid, MetricLabel, MetricValue } from '@/components/compare/metric-grid';
import { buildComparison } from '@/lib/compare/build-comparison';
import { METRIC_ROWS, type MetricRow } from '@/lib/compare/metric-rows';
import { nbsLookup } from '@/lib/thermo/species-library';
import { CARBON_BURN, forComparison, oneStep } from './compare-fixtures';

const kJ = { energyUnit: 'kJ', temperatureUnit: 'K' } as const;
const kcal = { energyUnit: 'kcal', temperatureUnit: 'K' } as const;
const { routes } = buildComparison([forComparison(oneStep('CO2(g)', CARBON_BURN), { id: 1 })], {}, nbsLookup);
const burn = routes[0]!.metrics;

describe('energy rows of the comparison', () => {
  it('hold the bare number with the true minus, in the reader’s unit', () => {
    expect(metricText('overallDeltaG0_kJ', burn, kJ)).toBe('\u2212394.4');
    // 394.359 / 4.184 = 94.25 kcal (thermochemical calorie, exact by definition).
    expect(metricText('overallDeltaG0_kJ', burn, kcal)).toBe('\u221294.3');
    expect(metricText('overallDeltaG0_kJ', burn, kJ)).not.toMatch(/kJ|kcal|-/);
  });

  it('state the unit once, for energy rows only', () => {
    expect(metricUnit('overallDeltaG_kJ', kJ)).toBe('kJ/mol');
    expect(metricUnit('largestUphill_kJ', kcal)).toBe('kcal/mol');
    expect(metricUnit('stepCount', kJ)).toBeNull();
    expect(metricUnit('temperatureSpan', kJ)).toBeNull();
  });
});

function Grid() {
  const helper = createColumnHelper<MetricRow>();
  const rows = METRIC_ROWS.filter((r) => r.key === 'overallDeltaG0_kJ' || r.key === 'stepCount');
  const columns = [
    helper.display({ id: 'metric', header: () => 'Metric', cell: ({ row }) => createElement(MetricLabel, { row: row.original, unit: metricUnit(row.original.key, kJ) }) }),
    helper.display({
      id: 'route-1',
      header: () => 'Carbon burn',
      cell: ({ row }) => createElement(MetricValue, { text: metricText(row.original.key, burn, kJ), isBest: false, unit: metricUnit(row.original.key, kJ) }),
    }),
  ];
  const table = useReactTable({ data: rows, columns, getCoreRowModel: getCoreRowModel(), getRowId: (r) => r.key });
  return createElement(MetricGrid, { table, caption: 'Compared routes' });
}

describe('the metrics grid', () => {
  const html = renderToStaticMarkup(createElement(Grid));
  const row = (key: string) => html.match(new RegExp(`<tr[^>]*data-metric="${key}"[\\s\\S]*?</tr>`))?.[0] ?? '';

  it('names the unit in the row header and keeps it out of the visible cell', () => {
    const energy = row('overallDeltaG0_kJ');
    expect(energy).toContain('Overall ΔG° (kJ/mol)');
    const cell = energy.match(/<td[\s\S]*?<\/td>/)?.[0] ?? '';
    expect(cell.replace(/<span class="sr-only">[^<]*<\/span>/, '').replace(/<[^>]+>/g, '')).toBe('\u2212394.4');
    expect(cell).toContain('<span class="sr-only"> kJ/mol</span>');
  });

  it('leaves counts as they are', () => {
    const count = row('stepCount');
    expect(count).not.toContain('(kJ/mol)');
    expect(count).not.toContain('sr-only');
  });
});
