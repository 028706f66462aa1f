// The phone layouts, server-rendered (no DOM in this suite): routes as cards, a table's scroll region, and the
// route page's read-only steps list. Which layout shows is the media query's job, checked by tests/e2e/narrow-screens.spec.ts.
import { getCoreRowModel, useReactTable, type SortingState } from '@tanstack/react-table';
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { RouteReadOnlyView } from '@/app/(app)/routes/[routeId]/_components/route-read-only-view';
import { DataTable } from '@/components/tables/data-table';
import { ROUTE_CARD_LAYOUT, routeColumns } from '@/components/tables/route-columns';
import { RowCards } from '@/components/tables/row-cards';
import type { RouteDraft } from '@/lib/schemas/route';
import type { RouteSummaryDto } from '@/lib/services/routes/route-dto';
import { RouteEditorStoreProvider } from '@/stores/route-editor-store';
import { sampleEvaluation } from '../ladder/ladder-fixture';

const noop = () => undefined;
const ROUTE: RouteSummaryDto = {
  id: 7, name: 'Methanol, Line 3 option A', target: 'CH3OH(g)', status: 'draft', stepCount: 2, overallDeltaG_kJ: -20, uphillSteps: 1,
  archived: false, originRouteId: null, updatedAt: '2026-12-02T09:14:00.000Z', updatedBy: 'Baptiste Osei',
};
const columns = routeColumns({
  energyUnit: 'kJ', canEdit: true, canDelete: true, busyRouteId: null, onDuplicate: noop, onArchive: noop, onDelete: noop,
  selection: { isSelected: () => false, onToggle: noop },
});

function Cards({ sorting }: { sorting: SortingState }) {
  const table = useReactTable({ data: [ROUTE], columns, state: { sorting }, manualSorting: true, getCoreRowModel: getCoreRowModel(), getRowId: (r) => String(r.id) });
  return createElement(RowCards<RouteSummaryDto>, { table, caption: 'Routes of your team', layout: ROUTE_CARD_LAYOUT, sorting, isBusy: false });
}

describe('routes as cards on a phone', () => {
  const html = renderToStaticMarkup(createElement(Cards, { sorting: [{ id: 'overallDeltaG', desc: true }] }));

  it('heads each card with its tick and name, labels every other value, and ends with the actions', () => {
    expect(html).toContain('<ul aria-label="Routes of your team"');
    expect(html).toMatch(/aria-label="Select Methanol, Line 3 option A to compare"[\s\S]*href="\/routes\/7"/);
    for (const label of ['Target', 'Status', 'Steps', 'Uphill steps', 'Last edited']) expect(html).toContain(`<dt class="text-xs text-ink-faint">${label}</dt>`);
    // One unit for route totals, stated once: in the label; the value is the bare number with the true minus.
    expect(html).toContain('<dt class="text-xs text-ink-faint"><span title="Overall free-energy change per mol of target, at each step&#x27;s conditions">Overall ΔG (kJ/mol)</span></dt>');
    expect(html).toMatch(/<dd[^>]*><span class="relative tabular-nums">\u221220\.0<span class="sr-only"> kJ\/mol<\/span><\/span><\/dd>/);
    // The actions close the card, after the facts.
    expect(html.indexOf('<dl')).toBeLessThan(html.indexOf('aria-label="Delete Methanol, Line 3 option A"'));
    // The tick and the actions are not repeated as facts.
    expect(html).not.toMatch(/<dt[^>]*>[^<]*(Compare|Actions)/);
  });

  it('offers the sortable columns as a menu, showing the sort in force', () => {
    const sortBy = html.match(/<select[^>]*>[\s\S]*?<\/select>/)?.[0] ?? '';
    expect(sortBy).toContain('<option value="overallDeltaG" selected="">Overall ΔG</option>');
    expect(sortBy).toContain('<option value="name">Name</option>');
    for (const id of ['target', 'steps', 'uphillSteps', 'updatedAt']) expect(sortBy).toContain(`value="${id}"`);
    expect(sortBy).not.toContain('value="status"');
    expect(sortBy).not.toContain('value="actions"');
    expect(html).toContain('<option value="desc" selected="">Descending</option>');
  });
});

describe('the routes table sorts by its headers', () => {
  it('makes each column the server sorts by a header button, and marks the sort in force', () => {
    const html = renderToStaticMarkup(
      createElement(DataTable<RouteSummaryDto>, { caption: 'Routes', data: [ROUTE], columns, sorting: [{ id: 'updatedAt', desc: true }], onSortingChange: noop, getRowId: (r) => String(r.id) }),
    );
    const headers = html.match(/<th[\s\S]*?<\/th>/g) ?? [];
    const buttons = headers.filter((h) => h.includes('<button')).map((h) => h.replace(/<[^>]+>/g, '').replace(/[▲▼↕]/g, ''));
    expect(buttons).toEqual(['Name', 'Target', 'Steps', 'Overall ΔG (kJ/mol)', 'Uphill steps', 'Last edited']);
    expect(headers.find((h) => h.includes('Last edited'))).toContain('aria-sort="descending"');
  });
});

describe('a wide table on a narrow screen', () => {
  it('scrolls inside a region named by its caption, which contains its sr-only header text', () => {
    const html = renderToStaticMarkup(
      createElement(DataTable<RouteSummaryDto>, { caption: 'Routes of your team', data: [ROUTE], columns, sorting: [], onSortingChange: noop, getRowId: (r) => String(r.id) }),
    );
    expect(html).toMatch(/^<div role="region" aria-label="Routes of your team" class="relative overflow-x-auto /);
    // Not focusable until a measurement says it scrolls.
    expect(html.slice(0, html.indexOf('>'))).not.toContain('tabindex');
  });
});

describe('the route page on a phone', () => {
  // Document order differs from route order on purpose: the list follows the step numbers.
  const evaluation = sampleEvaluation();
  const steps = ['loose', 'synth', 'bad', 'reform'].map((id) => ({ id, equation: evaluation.steps.find((s) => s.id === id)!.result?.equation ?? 'Xx(g) -> Yy(g)', yieldPct: 100, notes: '', position: { x: 0, y: 0 } }));
  const draft: RouteDraft = { name: 'Ammonia', target: 'NH3(g)', targetAmount: '1 mol', marginalThreshold_kJ: -10, steps, links: [{ from: 'reform', to: 'synth', species: 'H2(g)' }] };
  const labels = { reform: 'Step 1', synth: 'Step 2', bad: 'Step 3', loose: 'Step 4' };
  const html = renderToStaticMarkup(
    createElement(RouteEditorStoreProvider, {
      initialDoc: draft,
      initialVersion: 1,
      children: createElement(RouteReadOnlyView, {
        results: new Map(evaluation.steps.map((s) => [s.id, s])),
        stepLabels: labels,
        units: { energyUnit: 'kJ', temperatureUnit: 'K' },
      }),
    }),
  );
  const items = html.split('data-testid="read-only-step"').slice(1);

  it('lists the steps in route order, read-only, and says where the board is', () => {
    expect(items.map((item) => item.match(/Step \d/)?.[0])).toEqual(['Step 1', 'Step 2', 'Step 3', 'Step 4']);
    expect(html).toContain('at least 768 px wide');
    expect(html).not.toContain('<input');
  });

  it("gives each step its ΔG and its class in words", () => {
    // Steam reforming of methane is uphill at 298 K: ΔrG° ≈ +142 kJ/mol (NBS tables, 1982; from memory).
    expect(items[0]).toContain('Uphill');
    expect(items[0]).toMatch(/ΔG°? \+1\d\d(\.\d)? kJ\/mol/);
    // Ammonia synthesis is downhill at 298 K: ΔrG° ≈ −33 kJ/mol for 2 NH3 (NBS tables, 1982; from memory).
    expect(items[1]).toContain('Downhill');
    expect(items[1]).toMatch(/ΔG°? [−-]3\d(\.\d)? kJ\/mol/);
    // The step the engine cannot read says why, instead of a number.
    expect(items[2]).not.toMatch(/ΔG°? [+−-]?\d/);
    expect(items[2]).toContain('Not evaluated');
  });
});
