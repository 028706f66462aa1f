// What the routes list shows for a route: never a total of "0.0 kJ/mol" with "none" uphill when a step failed.
import { renderToStaticMarkup } from 'react-dom/server';
import { createElement } from 'react';
import { describe, expect, it } from 'vitest';
import { DataTable } from '@/components/tables/data-table';
import { routeColumns } from '@/components/tables/route-columns';
import type { StepInput } from '@/lib/schemas/route';
import { evaluateRouteDocument, summariseEvaluation } from '@/lib/services/routes/evaluate-route-document';
import type { RouteSummaryDto } from '@/lib/services/routes/route-dto';
import { builtinLookup } from '@/lib/thermo/species-library';

const step = (id: string, equation: string): StepInput => ({ id, equation, temperature: '298.15 K', yieldPct: 100, notes: '', position: { x: 0, y: 0 } });
const route = (steps: StepInput[]) => ({ name: 'R', target: 'CH3OH(g)', targetAmount: '1 mol', marginalThreshold_kJ: -17, steps, links: [] });

describe('the saved summary of a route', () => {
  it('holds no total and no uphill count when a step could not be evaluated', () => {
    const doc = route([step('a', 'CO(g) + 2 H2(g) -> CH3OHH(g)')]);
    expect(summariseEvaluation(doc, evaluateRouteDocument(doc, builtinLookup))).toEqual({ stepCount: 1, overallDgKj: null, uphillSteps: null });
  });

  it('holds the total per mol of target when every step evaluates (CO + 2 H2 → CH3OH(g), ΔG° ≈ −25 kJ/mol at 298 K, NBS 1982 from memory)', () => {
    const doc = route([step('a', 'CO(g) + 2 H2(g) -> CH3OH(g)')]);
    const summary = summariseEvaluation(doc, evaluateRouteDocument(doc, builtinLookup));
    expect(summary.overallDgKj).toBeCloseTo(-25, -1);
    expect(summary.uphillSteps).toBe(0);
  });
});

describe('the routes list', () => {
  const row: RouteSummaryDto = {
    id: 1, name: 'Kestrel trial', target: 'CH3OH(g)', status: 'in_review', stepCount: 2, overallDeltaG_kJ: null, uphillSteps: null,
    archived: false, originRouteId: null, updatedAt: '2026-12-01T10:00:00.000Z', updatedBy: 'Ana',
  };
  const html = () =>
    renderToStaticMarkup(
      createElement(DataTable<RouteSummaryDto>, {
        data: [row], columns: routeColumns({ energyUnit: 'kJ', canEdit: false, busyRouteId: null, onDuplicate: () => {}, onArchive: () => {} }), caption: 'Routes',
      } as never),
    );

  it('says a route without a total is not evaluated, and writes statuses as words', () => {
    const out = html();
    expect(out).toContain('not evaluated');
    expect(out).not.toContain('0.0 kJ/mol');
    expect(out).toContain('In review');
    expect(out).not.toMatch(/in_review|In_review/);
    expect(out).toContain('CH<sub>3</sub>OH(g)');
  });
});
