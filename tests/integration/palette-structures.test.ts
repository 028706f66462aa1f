// GET /api/palette answers the structures of each entry with something to draw: library reactions by their
// species' structures, the team's recent equations with the labels their latest step binds to a SMILES.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { GET as palette } from '@/app/api/palette/route';
import { PUT as saveRoute } from '@/app/api/routes/[routeId]/route';
import { POST as createRoute } from '@/app/api/routes/route';
import type { StepStructures } from '@/components/chemistry/structure-brief';
import type { RouteDocumentDto } from '@/lib/services/routes/route-dto';
import { makeRoleSet } from './support/fixtures';
import { callRoute } from './support/http';
import { setupTestDb, teardownTestDb } from './support/test-db';

let dir = '';
let w: Awaited<ReturnType<typeof makeRoleSet>>;
beforeAll(async () => {
  ({ dir } = await setupTestDb());
  w = await makeRoleSet();
});
afterAll(async () => teardownTestDb(dir));

const LABELLED = 'ketone + H2(g) -> alcohol';

describe('palette structures', () => {
  it('draws library reactions and recent equations whose labels a step binds to a structure', async () => {
    const created = (await callRoute(createRoute, { method: 'POST', userId: w.designerId, body: { name: 'Hydrogenation', target: 'alcohol', targetAmount: '1 mol' } })).body as RouteDocumentDto;
    const step = {
      id: 's1', equation: LABELLED, temperature: '298.15 K', yieldPct: 100, notes: '', position: { x: 0, y: 0 },
      species: { ketone: { smiles: 'CC(=O)c1ccccc1', phase: 'aq' }, alcohol: { smiles: 'CC(O)c1ccccc1', phase: 'aq' } },
    };
    const saved = await callRoute(saveRoute, {
      method: 'PUT', userId: w.designerId, params: { routeId: String(created.id) },
      body: { version: created.version, name: created.name, target: 'alcohol', targetAmount: '1 mol', marginalThreshold_kJ: -17, steps: [step], links: [] },
    });
    expect(saved.status).toBe(200);

    const res = await callRoute(palette, { userId: w.designerId, path: '/api/palette?species=C2H5OH(g)' });
    expect(res.status).toBe(200);
    const body = res.body as { recent: string[]; library: { equation: string }[]; structures: Record<string, StepStructures>; labels: Record<string, unknown> };
    expect(body.recent).toContain(LABELLED);
    // Dropped with the equation, so the new step binds its labels as the old one did.
    expect(body.labels[LABELLED]).toEqual(step.species);
    const labelled = body.structures[LABELLED]!;
    expect(labelled.reactants.map((s) => s.asWritten)).toEqual(['ketone', 'H2(g)']);
    expect(labelled.reactants[0]).toMatchObject({ formula: 'C8H8O', smiles: expect.stringContaining('c1ccccc1') });
    expect(labelled.products[0]).toMatchObject({ asWritten: 'alcohol', formula: 'C8H10O' });
    const hydration = body.library.find((r) => r.equation === 'C2H4(g) + H2O(g) -> C2H5OH(g)');
    expect(hydration).toBeDefined();
    expect(body.structures[hydration!.equation]!.products[0]).toMatchObject({ name: 'ethanol', formula: 'C2H6O' });
  });
});
