// The routes list's compare ticks and bar, the route file reader of the import dialog, and the editor's alternatives menu.
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { AlternativesList, alternativesCompareIds } from '@/app/(app)/routes/[routeId]/_components/alternatives-menu';
import { describeImportField, MAX_ROUTE_FILE_BYTES, readRouteFile } from '@/app/(app)/routes/import-route-dialog';
import { CompareSelectionBar, selectionState } from '@/components/tables/compare-selection-bar';
import { DataTable } from '@/components/tables/data-table';
import { routeColumns } from '@/components/tables/route-columns';
import type { RouteAlternativesDto } from '@/lib/services/routes/list-alternatives';
import type { RouteSummaryDto } from '@/lib/services/routes/route-dto';

const noop = () => undefined;
const ROUTE: RouteSummaryDto = {
  id: 7, name: 'Methanol, Line 3 option A', target: 'CH3OH(g)', status: 'draft', stepCount: 2, overallDeltaG_kJ: -20, uphillSteps: 1,
  archived: false, originRouteId: null, updatedAt: '2026-12-02T09:14:00.000Z', updatedBy: 'Baptiste Osei',
};
const ARCHIVED: RouteSummaryDto = { ...ROUTE, id: 8, name: 'Methanol, old furnace', archived: true };

const listHtml = (selected: number[]) =>
  renderToStaticMarkup(
    createElement(DataTable<RouteSummaryDto>, {
      caption: 'test', data: [ROUTE, ARCHIVED], sorting: [], onSortingChange: noop, getRowId: (r) => String(r.id),
      columns: routeColumns({
        energyUnit: 'kJ', canEdit: false, busyRouteId: null, onDuplicate: noop, onArchive: noop,
        selection: { isSelected: (id) => selected.includes(id), onToggle: noop },
      }),
    }),
  );
const checkbox = (html: string, name: string) => html.match(new RegExp(`<input[^>]*aria-label="Select ${name} to compare"[^>]*>`))?.[0] ?? '';
const bar = (count: number) =>
  renderToStaticMarkup(
    createElement(CompareSelectionBar, { selected: Array.from({ length: count }, (_, i) => ({ id: i + 1, name: `Option ${i + 1}` })), onCompare: noop, onUntick: noop, onClear: noop }),
  );
const compareButton = (html: string) => html.match(/<button[^>]*>Compare selected \(\d+\)<\/button>/)?.[0] ?? '';

describe('compare ticks on the routes list', () => {
  it('gives each row a labelled checkbox that shows whether it is ticked, and none is tickable when archived', () => {
    const html = listHtml([7]);
    expect(checkbox(html, 'Methanol, Line 3 option A')).toContain('checked=""');
    expect(checkbox(html, 'Methanol, old furnace')).toContain('disabled=""');
    expect(checkbox(html, 'Methanol, old furnace')).not.toContain('checked=""');
    expect(checkbox(listHtml([]), 'Methanol, Line 3 option A')).not.toContain('checked=""');
  });

  it('has no tick column without a selection', () => {
    const html = renderToStaticMarkup(
      createElement(DataTable<RouteSummaryDto>, {
        caption: 'test', data: [ROUTE], sorting: [], onSortingChange: noop, getRowId: () => '1',
        columns: routeColumns({ energyUnit: 'kJ', canEdit: false, busyRouteId: null, onDuplicate: noop, onArchive: noop }),
      }),
    );
    expect(html).not.toContain('to compare');
  });

  it('enables "Compare selected (n)" for 2 to 4 ticks only, and says why past 4', () => {
    expect([0, 1, 2, 3, 4, 5].map((n) => selectionState(n).canCompare)).toEqual([false, false, true, true, true, false]);
    expect(compareButton(bar(1))).toContain('disabled=""');
    expect(compareButton(bar(2))).not.toContain('disabled=""');
    expect(compareButton(bar(4))).not.toContain('disabled=""');
    const five = bar(5);
    expect(compareButton(five)).toContain('disabled=""');
    expect(five).toContain('Compare at most 4 routes at once: untick 1 of them.');
    expect(five).toContain('aria-label="Untick Option 5"');
  });
});

const file = (text: string, name = 'route.json') => new File([text], name, { type: 'application/json' });

describe('reading a route file before import', () => {
  it('refuses a file over 1 MB without reading it', async () => {
    const big = await readRouteFile(file('x'.repeat(MAX_ROUTE_FILE_BYTES + 1), 'big.json'));
    expect(big).toEqual({ ok: false, message: '“big.json” is 1.0 MB; a route file can be at most 1 MB. Nothing was sent.' });
    expect((await readRouteFile(file(`{"pad":"${'x'.repeat(MAX_ROUTE_FILE_BYTES - 12)}"}`))).ok).toBe(true);
  });

  it('says so for malformed JSON, an empty file, and JSON that is not one object', async () => {
    const broken = await readRouteFile(file('{"target": "NH3(g)", "steps": [', 'broken.json'));
    expect(broken.ok).toBe(false);
    expect(!broken.ok && broken.message).toMatch(/^“broken\.json” is not valid JSON \(.+\)\. Nothing was sent\.$/);
    expect(await readRouteFile(file('  \n'))).toEqual({ ok: false, message: '“route.json” is empty. Nothing was sent.' });
    for (const text of ['[1, 2]', '"steps"', 'null']) expect((await readRouteFile(file(text))).ok).toBe(false);
  });

  it('hands back the parsed object of a well-formed file', async () => {
    const body = { target: 'NH3(g)', steps: [{ id: 'a', equation: 'N2(g) + 3 H2(g) -> 2 NH3(g)' }] };
    expect(await readRouteFile(file(JSON.stringify(body)))).toEqual({ ok: true, json: body });
  });

  it('names the server’s field paths in words, with the step’s id from the file', () => {
    const json = { steps: [{ id: 'reform' }, { id: 'synthesis' }] };
    expect(describeImportField('steps.1.equation', json)).toBe('Step 2 (“synthesis”), equation');
    expect(describeImportField('steps.4.temperature', json)).toBe('Step 5, temperature');
    expect(describeImportField('links.0.from')).toBe('Link 1, from');
    expect(describeImportField('steps')).toBe('steps');
    expect(describeImportField('stepwell.positions.s9')).toBe('stepwell › positions › s9');
    expect(describeImportField('_')).toBe('The file');
  });
});

const ref = (id: number, name: string, archived = false) => ({ id, name, status: 'draft', archived });
const alt = (id: number, name: string, archived = false) => ({ ...ref(id, name, archived), updatedAt: '2026-12-01T08:00:00.000Z' });

describe('the alternatives menu', () => {
  it('compares this route first, then its origin and alternatives, leaving archived ones out and stopping at 4', () => {
    const data: RouteAlternativesDto = { origin: ref(1, 'Base'), alternatives: [alt(11, 'B'), alt(12, 'Old', true), alt(13, 'C'), alt(14, 'D')] };
    expect(alternativesCompareIds(10, data)).toEqual({ ids: [10, 1, 11, 13], leftOut: 1 });
    expect(alternativesCompareIds(10, { origin: null, alternatives: [alt(11, 'B')] })).toEqual({ ids: [10, 11], leftOut: 0 });
  });

  it('lists origin and alternatives as links with a "Compare these" link to the compare page', () => {
    const html = renderToStaticMarkup(createElement(AlternativesList, { routeId: 10, data: { origin: ref(1, 'Ammonia, base case'), alternatives: [alt(11, 'Ammonia, lower pressure')] } }));
    expect(html).toContain('Duplicated from');
    expect(html).toContain('href="/routes/1"');
    expect(html).toContain('href="/routes/11"');
    expect(html).toMatch(/<a[^>]*href="\/routes\/compare\?ids=10,1,11"[^>]*>Compare these<\/a>/);
  });

  it('offers no compare link when every other route is archived, and says when there is nothing yet', () => {
    const onlyArchived = renderToStaticMarkup(createElement(AlternativesList, { routeId: 10, data: { origin: null, alternatives: [alt(11, 'Old', true)] } }));
    expect(onlyArchived).not.toContain('Compare these');
    expect(onlyArchived).toContain('archived, not compared');
    expect(renderToStaticMarkup(createElement(AlternativesList, { routeId: 10, data: { origin: null, alternatives: [] } }))).toContain('No alternatives yet.');
  });
});
