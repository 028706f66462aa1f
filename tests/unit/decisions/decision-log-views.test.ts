// Server-renders the decision log table and one decision's page (no DOM in this suite) to check what each shows.
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { DecisionDetail } from '@/app/(app)/decisions/[decisionId]/decision-detail-client';
import { SnapshotMetrics, whatIfText } from '@/app/(app)/decisions/_components/snapshot-metrics';
import { DataTable } from '@/components/tables/data-table';
import { decisionColumns } from '@/components/tables/decision-columns';
import type { MetricKey, RouteMetrics } from '@/lib/compare/compare-types';
import { METRIC_ROWS } from '@/lib/compare/metric-rows';
import type { DecisionDetailDto, DecisionSummaryDto } from '@/lib/services/decisions/decision-dto';

const noop = () => undefined;
const RATIONALE = 'No uphill step at 500 K.\nThe reformer route needs a driver, and the furnace is booked until spring.';
const SUMMARY: DecisionSummaryDto = {
  id: 3,
  createdAt: '2026-12-02T09:14:00.000Z',
  routes: [
    { id: 21, name: 'Methanol via partial oxidation', deleted: false },
    { id: 22, name: 'Methanol via steam reforming', deleted: true },
  ],
  chosen: { id: 21, name: 'Methanol via partial oxidation', deleted: false },
  rationale: RATIONALE,
  author: { id: 1, name: 'Ottilie Marchetti' },
  supersededById: 5,
  shelvedRouteIds: [22],
};

const metrics = (over: Partial<RouteMetrics>): RouteMetrics => ({
  overallDeltaG_kJ: -90, overallDeltaG0_kJ: -80, stepCount: 2, uphillSteps: 0, marginalSteps: 0, errorSteps: 0, largestUphill_kJ: null,
  smallestDrivingForce_kJ: 25, temperatureMin_K: 500, temperatureMax_K: 500, driversNeeded: [], uncoupledUphillSteps: 0, estimatedSteps: 2, openFlags: 0,
  unresolvedComments: 1, status: 'draft', updatedAt: '2026-12-01T10:00:00.000Z', updatedBy: 'Baptiste Osei', ...over,
});
const best = Object.fromEntries(METRIC_ROWS.map((r) => [r.key, [] as number[]])) as Record<MetricKey, number[]>;
const DETAIL: DecisionDetailDto = {
  ...SUMMARY,
  snapshot: {
    whatIf: { temperatureOffset_K: 50 },
    routes: [
      { id: 21, name: 'Methanol via partial oxidation', status: 'draft', metrics: metrics({}) },
      { id: 22, name: 'Methanol via steam reforming', status: 'draft', metrics: metrics({ overallDeltaG_kJ: -40, uphillSteps: 1, largestUphill_kJ: 30, driversNeeded: ['Hydrogen burn'] }) },
    ],
    best: { ...best, overallDeltaG_kJ: [21], uphillSteps: [21] },
    sharedEquations: [],
  },
};

const log = (rows: DecisionSummaryDto[]) =>
  renderToStaticMarkup(createElement(DataTable<DecisionSummaryDto>, { caption: 'log', data: rows, columns: decisionColumns(), sorting: [], onSortingChange: noop, getRowId: (d) => String(d.id) }));
const units = { energyUnit: 'kJ', temperatureUnit: 'K' } as const;

describe('the decision log table', () => {
  it('shows date, routes, choice, the whole rationale, author, and which decision superseded it', () => {
    const html = log([SUMMARY]);
    expect(html).toContain('dateTime="2026-12-02T09:14:00.000Z"');
    expect(html).toContain('href="/decisions/3"');
    expect(html).toContain('href="/routes/21"');
    expect(html).toContain('Ottilie Marchetti');
    expect(html).toContain('whitespace-pre-wrap');
    expect(html).toContain(RATIONALE);
    expect(html).toMatch(/superseded by <a[^>]*href="\/decisions\/5"[^>]*>#5<\/a>/);
    expect(html).toContain('1 other shelved');
  });

  it('marks a deleted route and does not link to it; a current decision says so', () => {
    const html = log([{ ...SUMMARY, supersededById: null, shelvedRouteIds: [] }]);
    expect(html).toContain('Methanol via steam reforming <span class="rounded bg-paper-deep px-1 text-[11px] text-ink-faint">deleted</span>');
    expect(html).not.toContain('href="/routes/22"');
    expect(html).toContain('Current');
    expect(html).not.toContain('superseded by');
    expect(html).not.toContain('shelved');
  });
});

describe('one decision', () => {
  it('puts every metric row of the snapshot in a table, with best values marked in words', () => {
    const html = renderToStaticMarkup(createElement(SnapshotMetrics, { snapshot: DETAIL.snapshot, units, chosenRouteId: 21 }));
    // Energy rows state their unit once, beside the name; their cells hold the bare number (the unit for screen readers).
    const withUnit = (label: string, key: string) => (key.endsWith('_kJ') ? `${label} (kJ/mol)` : label);
    for (const row of METRIC_ROWS) expect(html).toContain(`<span class="font-medium">${withUnit(row.label, row.key).replace(/'/g, '&#x27;')}</span>`);
    expect(html.match(/>best<\/span>/g)).toHaveLength(2);
    expect(html).toContain('−90.0<span class="sr-only"> kJ/mol</span>');
    expect(html).not.toContain('−90.0 kJ');
    expect(html).toContain('Hydrogen burn');
    expect(html).toContain('>chosen</span>');
  });

  it('shows the estimated-values count, and a dash for a decision recorded before that row existed', () => {
    const { estimatedSteps: _gone, ...old } = metrics({});
    const snapshot = { ...DETAIL.snapshot, routes: [DETAIL.snapshot.routes[0]!, { ...DETAIL.snapshot.routes[1]!, metrics: old }] };
    const html = renderToStaticMarkup(createElement(SnapshotMetrics, { snapshot, units, chosenRouteId: 21 }));
    const row = html.slice(html.indexOf('Estimated values used'), html.indexOf('</tr>', html.indexOf('Estimated values used')));
    expect(row).toMatch(/>2<\/span>[\s\S]*>—<\/span>/);
    expect(row).not.toContain('undefined');
  });

  it('says what-if in words', () => {
    expect(whatIfText({}, 'K')).toBe('At the routes’ saved conditions (no what-if).');
    expect(whatIfText({ temperatureOffset_K: 50, standardPressure: '1 atm' }, 'K')).toBe('What-if: every step +50 K from its saved temperature; standard pressure 1 atm.');
  });

  it('shows a superseded decision as such, with the shelved route, the rationale and the screen’s limits', () => {
    const html = renderToStaticMarkup(createElement(QueryClientProvider, { client: new QueryClient() }, createElement(DecisionDetail, { decision: DETAIL })));
    expect(html).toContain('Decision #3');
    expect(html).toContain('Superseded by decision #5');
    expect(html).toContain(RATIONALE);
    expect(html).toMatch(/Shelved by it<\/dt><dd><ul[^>]*><li><span[^>]*>Methanol via steam reforming <span[^>]*>deleted/);
    expect(html).toContain('It says nothing about rates, selectivity, toxicity or hazards.');
    expect(html).toContain('What-if: every step +50 K from its saved temperature.');
  });
});
