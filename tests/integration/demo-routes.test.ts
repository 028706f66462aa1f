// The seeded demo routes, evaluated the way the board evaluates them (POST /api/routes/[id]/evaluate as the demo
// designer): every step evaluates, every link carries extent, and the two routes built on structures use estimated
// species and say so. Chemistry checked against common practice, from memory: nitro reductions release about
// −550 kJ/mol of heat (nitrobenzene to aniline; the demo reduces 4-nitroaniline), and the isopropanol-coupled ketone reduction has K of order 1.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { POST as evaluateSavedRoute } from '@/app/api/routes/[routeId]/evaluate/route';
import { getDb } from '@/db';
import { runSeeders } from '@/db/seeders';
import { DEMO_ROUTES } from '@/db/seeders/demo-routes';
import { BOC_BUILDING_BLOCK, KRED_REDUCTION } from '@/db/seeders/demo-estimated-routes';
import { DEMO_USERS } from '@/db/seeders/demo-team';
import type { RouteEvaluateResponse } from '@/lib/thermo/route';
import { countEstimatedSteps } from '@/lib/thermo/route/step-estimates';
import { callRoute } from './support/http';
import { setupTestDb, teardownTestDb } from './support/test-db';

let dir = '';
const evaluations = new Map<string, RouteEvaluateResponse>();
beforeAll(async () => {
  ({ dir } = await setupTestDb());
  await runSeeders(getDb());
  const designer = await getDb().models.User.findOne({ where: { email: DEMO_USERS.find((u) => u.role === 'designer')!.email } });
  for (const route of await getDb().models.Route.findAll()) {
    const res = await callRoute(evaluateSavedRoute, { method: 'POST', userId: designer!.id, params: { routeId: String(route.id) } });
    expect(res.status, JSON.stringify(res.body).slice(0, 400)).toBe(200);
    const body = res.body as { evaluation?: RouteEvaluateResponse };
    expect(body.evaluation, JSON.stringify(res.body).slice(0, 400)).toBeDefined();
    evaluations.set(route.name, body.evaluation!);
  }
}, 120_000);
afterAll(async () => teardownTestDb(dir));

describe('the seeded demo routes', () => {
  it('all evaluate: no step errors, no warnings, every step counted in the totals', () => {
    expect([...evaluations.keys()].sort()).toEqual(DEMO_ROUTES.map((r) => r.name).sort());
    for (const [name, e] of evaluations) {
      expect(e.steps.filter((s) => s.error).map((s) => `${name}: ${s.error!.message}`)).toEqual([]);
      expect(e.warnings.map((w) => `${name}: ${w.message}`)).toEqual([]);
      expect(e.steps.every((s) => s.extent_mol !== null), name).toBe(true);
    }
  });

  it('keeps the methanol routes on tabulated values only', () => {
    for (const plan of DEMO_ROUTES.filter((r) => r.target === 'CH3OH(g)')) expect(countEstimatedSteps(evaluations.get(plan.name)!.steps)).toBe(0);
  });

  it('runs the Boc building block on estimated values in every step, with the nitro reduction strongly exothermic', () => {
    const e = evaluations.get(BOC_BUILDING_BLOCK.name)!;
    expect(e.order).toEqual(['reduce', 'amide', 'boc']);
    expect(countEstimatedSteps(e.steps)).toBe(3);
    const reduce = e.steps.find((s) => s.id === 'reduce')!;
    expect(reduce.result!.species.find((s) => s.as_written === 'PNA')!.origin).toBe('estimated');
    expect(reduce.result!.deltaH0_kJ).toBeGreaterThan(-650);
    expect(reduce.result!.deltaH0_kJ).toBeLessThan(-450);
    expect(reduce.notes.map((n) => n.code)).toContain('HEAT_RELEASE');
    expect(e.steps.find((s) => s.id === 'boc')!.notes.map((n) => n.code)).toContain('GAS_EVOLUTION');
    expect(e.overall.overallSigma_kJ!).toBeGreaterThan(0);
  });

  it('names every species of the Boc building block as the identifier table knows it, all but the carbamate no table has', () => {
    // Formulas from the structures (4'-aminoacetanilide is CAS 122-80-5; from memory). The designer's e2e
    // (tests/e2e/fine-chemical-from-scratch.spec.ts) finds the same named species in "Add species".
    const bySmiles = BOC_BUILDING_BLOCK.steps.flatMap((s) => Object.entries(s.species ?? {}).filter(([, d]) => 'smiles' in d).map(([label]) => label));
    expect([...new Set(bySmiles)]).toEqual([BOC_BUILDING_BLOCK.target]);
    const species = new Map(evaluations.get(BOC_BUILDING_BLOCK.name)!.steps.flatMap((s) => s.result!.species).map((s) => [s.as_written, s]));
    const named = { PNA: ['4-nitroaniline', 'C6H6N2O2'], PPD: ['p-phenylenediamine', 'C6H8N2'], AcPPD: ["4'-aminoacetanilide", 'C8H10N2O'], Boc2O: ['di-tert-butyl dicarbonate', 'C10H18O5'] };
    for (const [label, [name, formula]] of Object.entries(named)) expect(species.get(label), label).toMatchObject({ name, formula, origin: 'estimated' });
    expect(species.get('tBuOH')).toMatchObject({ name: 'tert-butanol', formula: 'C4H10O', origin: 'library' });
    expect(species.get('BocAcPPD')).toMatchObject({ formula: 'C13H18N2O3', smiles: 'CC(=O)Nc1ccc(NC(=O)OC(C)(C)C)cc1', origin: 'estimated' });
  });

  it('shows the coupled ketone reduction as estimated and sign-uncertain, step and total', () => {
    const e = evaluations.get(KRED_REDUCTION.name)!;
    const step = e.steps[0]!;
    expect(step.result!.species.every((s) => s.origin === 'estimated')).toBe(true);
    expect(Math.abs(step.result!.deltaG0_kJ)).toBeLessThan(10);
    expect(step.signUncertain).toBe(true);
    expect(e.overall.overallSignUncertain).toBe(true);
  });

  it('stores the species maps and the notes the plans give', async () => {
    const route = await getDb().models.Route.findOne({ where: { name: KRED_REDUCTION.name } });
    const [step] = await getDb().models.Step.findAll({ where: { routeId: route!.id } });
    expect((step!.conditions as { species?: unknown }).species).toEqual(KRED_REDUCTION.steps[0]!.species);
    expect(step!.notes).toMatch(/cannot be estimated/);
    expect(step!.notes).toMatch(/Removing acetone/);
  });
});
