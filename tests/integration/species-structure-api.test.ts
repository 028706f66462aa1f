// Species by structure over the API: GET /api/species/resolve, POST /api/evaluate with a species map, POST /api/balance
// with the team's species, and every kind of bad structure input answered 400 in the error shape. Published values
// named beside each check come from the organic library (lib/thermo/data/source/organics/species.csv).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { POST as balance } from '@/app/api/balance/route';
import { POST as evaluate } from '@/app/api/evaluate/route';
import { POST as createSpecies } from '@/app/api/species/route';
import { GET as resolve } from '@/app/api/species/resolve/route';
import { POST as evaluateSavedRoute } from '@/app/api/routes/[routeId]/evaluate/route';
import { GET as exportRoute } from '@/app/api/routes/[routeId]/export/route';
import { createRoute } from '@/lib/services/routes/create-route';
import { saveRoute } from '@/lib/services/routes/save-route';
import { makeTeamWithLead } from './support/fixtures';
import { getDb } from '@/db';
import { callRoute, errorOf } from './support/http';
import { setupTestDb, teardownTestDb } from './support/test-db';

let dir = '';
let userId = 0;
beforeAll(async () => {
  ({ dir } = await setupTestDb());
  userId = (await makeTeamWithLead('structures')).leadId;
});
afterAll(async () => teardownTestDb(dir));

const get = (query: Record<string, string>) => callRoute(resolve, { userId, path: `/api/species/resolve?${new URLSearchParams(query).toString()}` });

interface Answer { origin: string; source?: string; method?: string; groups?: unknown[]; inchikey: string; smiles: string; dfH_kJ: number; dfG_kJ: number; sigma_dfG_kJ: number; name: string }

describe('GET /api/species/resolve', () => {
  it('finds ethyl acetate(l) in the library by SMILES, with its source (NIST WebBook ΔfH° −480.148 kJ/mol)', async () => {
    const res = await get({ smiles: 'O=C(OCC)C', phase: 'l' });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const a = res.body as Answer;
    expect(a).toMatchObject({ origin: 'library', inchikey: 'XEKOWRVHYACXOJ-UHFFFAOYSA-N', smiles: 'CCOC(C)=O', name: 'ethyl acetate' });
    expect(a.source).toMatch(/WebBook/);
    expect(a.dfH_kJ).toBeCloseTo(-480.148, 3);
  });

  it('estimates Boc anhydride by name, marked as an estimate with its method, groups and σ', async () => {
    const res = await get({ name: 'Boc anhydride', phase: 'l' });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const a = res.body as Answer;
    expect(a.origin).toBe('estimated');
    expect(a.source).toBeUndefined();
    expect(a.method).toMatch(/group additivity/);
    expect(a.groups!.length).toBeGreaterThan(3);
    expect(a.sigma_dfG_kJ).toBeGreaterThan(2);
  });

  it('gives the same structure the same identity whatever was typed (InChIKey and phase)', async () => {
    const bySmiles = (await get({ smiles: 'CC(C)O', phase: 'l' })).body as Answer;
    const byName = (await get({ name: 'isopropanol', phase: 'l' })).body as Answer;
    expect(byName.inchikey).toBe(bySmiles.inchikey);
    expect(byName.dfG_kJ).toBe(bySmiles.dfG_kJ);
  });

  it('forces the estimator with estimate=true, for comparison with the tabulated value', async () => {
    const tabulated = (await get({ smiles: 'CCOC(C)=O', phase: 'g' })).body as Answer;
    const estimated = (await get({ smiles: 'CCOC(C)=O', phase: 'g', estimate: 'true' })).body as Answer;
    expect(tabulated.origin).toBe('library');
    expect(estimated.origin).toBe('estimated');
    // NIST WebBook ΔfH°(g) −445.061 kJ/mol; the estimate must land within its own 3σ.
    expect(Math.abs(estimated.dfH_kJ - tabulated.dfH_kJ)).toBeLessThan(3 * estimated.sigma_dfG_kJ + 5);
  });

  it('answers the team’s own species as origin team', async () => {
    const made = await callRoute(createSpecies, { method: 'POST', userId, body: { formula: 'C21H44', phase: 'g', name: 'henicosane (team value)', aliases: ['kr henicosane'], dfH: -400, S: 700, provenance: { kind: 'citation', citation: 'Kestrel Ridge notebook KR-31, p. 2' } } });
    expect(made.status, JSON.stringify(made.body)).toBe(201);
    const res = await get({ key: 'C21H44(g)' });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect((res.body as Answer).origin).toBe('team');
  });

  it.each([
    [{ smiles: 'C1CC(', phase: 'g' }, 'INVALID_STRUCTURE', 'smiles', /position|not valid|never closed/],
    [{ smiles: 'C(C)(C)(C)(C)C', phase: 'g' }, 'INVALID_STRUCTURE', 'smiles', /valence/],
    [{ smiles: '[CH3]', phase: 'g' }, 'UNSUPPORTED_STRUCTURE', 'smiles', /radical/],
    [{ smiles: 'CP(C)C', phase: 'g' }, 'UNSUPPORTED_STRUCTURE', 'smiles', /P\)/],
    [{ smiles: 'CC(=O)[O-]', phase: 'aq' }, 'UNSUPPORTED_STRUCTURE', 'smiles', /pKa/],
    [{ smiles: 'C'.repeat(2000), phase: 'g' }, 'VALIDATION', 'smiles', /600/],
    [{ smiles: 'CC(=O)c1ccccc1', phase: 's' }, 'UNSUPPORTED_STRUCTURE', 'phase', /solids/],
    [{ name: 'glucose', phase: 'aq' }, 'AMBIGUOUS_NAME', 'name', /different compounds/],
    [{ name: 'unobtainium', phase: 'g' }, 'UNKNOWN_SPECIES', 'name', /No compound/],
    [{ smiles: 'CCO', name: 'ethanol', phase: 'l' }, 'VALIDATION', 'smiles', /exactly one/],
  ] as const)('%j answers 400 %s at %s', async (query, code, field, message) => {
    const res = await get(query as unknown as Record<string, string>);
    expect(res.status).toBe(400);
    const error = errorOf(res.body);
    expect(error.code).toBe(code);
    expect(Object.keys(error.fields ?? {})).toContain(field);
    expect(error.fields![field]).toMatch(message);
  });

  it('offers the choices for an ambiguous name', async () => {
    const res = await get({ name: 'glucose', phase: 'aq' });
    const error = (res.body as { error: { details?: { choices?: { smiles: string }[] } } }).error;
    expect(error.details?.choices?.length).toBeGreaterThan(1);
  });
});

describe('POST /api/evaluate with a species map', () => {
  it('evaluates the esterification by labels, and says where every species comes from', async () => {
    const res = await callRoute(evaluate, {
      method: 'POST', userId,
      body: {
        equation: 'AcOH + EtOH -> EtOAc + H2O(l)',
        species: { AcOH: { smiles: 'CC(=O)O', phase: 'l' }, EtOH: { name: 'ethanol', phase: 'l' }, EtOAc: { smiles: 'CCOC(C)=O', phase: 'l' } },
        temperature: '351 K',
        concentrations: {},
      },
    });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const body = res.body as { deltaG0_kJ: number; species: { as_written: string; origin: string; inchikey: string | null; smiles: string | null; source: string; sigma_dfG_kJ: number | null }[] };
    expect(body.species.map((s) => s.as_written)).toEqual(['AcOH', 'EtOH', 'EtOAc', 'H2O(l)']);
    expect(body.species.every((s) => s.origin === 'library')).toBe(true);
    expect(body.species.find((s) => s.as_written === 'EtOAc')).toMatchObject({ inchikey: 'XEKOWRVHYACXOJ-UHFFFAOYSA-N', smiles: 'CCOC(C)=O' });
    // Esterification of acetic acid with ethanol is close to thermoneutral in the liquid (K ≈ 4 near room temperature, common practice).
    expect(Math.abs(body.deltaG0_kJ)).toBeLessThan(15);
  });

  it('marks an estimated species in the answer, and names the field of a bad definition', async () => {
    const ok = await callRoute(evaluate, { method: 'POST', userId, body: { equation: 'Boc2O + H2O(l) -> 2 tBuOH + 2 CO2(g)', species: { Boc2O: { name: 'Boc anhydride', phase: 'l' }, tBuOH: { name: 'tert-butanol', phase: 'l' } } } });
    expect(ok.status, JSON.stringify(ok.body)).toBe(200);
    const boc = (ok.body as { species: { as_written: string; origin: string; method?: string }[] }).species.find((s) => s.as_written === 'Boc2O')!;
    expect(boc.origin).toBe('estimated');
    expect(boc.method).toMatch(/group additivity/);
    const bad = await callRoute(evaluate, { method: 'POST', userId, body: { equation: 'X(g) -> Y(g)', species: { X: { smiles: 'C1CC', phase: 'g' } } } });
    expect(bad.status).toBe(400);
    expect(errorOf(bad.body)).toMatchObject({ code: 'INVALID_STRUCTURE', fields: { 'species.X.smiles': expect.any(String) } });
  });

  it('reads names with a phase in the equation without a map', async () => {
    const res = await callRoute(evaluate, { method: 'POST', userId, body: { equation: 'nitrobenzene(l) + 3 H2(g) -> aniline(l) + 2 H2O(l)' } });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
  });
});

describe('POST /api/balance', () => {
  it('knows the team’s own species by name (it used to check against the built-in library only)', async () => {
    const res = await callRoute(balance, { method: 'POST', userId, body: { equation: 'kr henicosane(g) + 32 O2(g) -> 21 CO2(g) + 22 H2O(g)' } });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body).toMatchObject({ isBalanced: true });
  });
});

describe('a saved route step with a species map', () => {
  it('keeps the labels, evaluates them (estimating what no table has) and exports them in the route file', async () => {
    const { teamId } = (await getDb().models.Membership.findOne({ where: { userId } }))!;
    const route = await createRoute({ teamId, userId, input: { name: 'KRED reduction, IPA-coupled', target: 'acetone(l)', targetAmount: '1 mol' } });
    const species = { ketone: { smiles: 'CC(=O)c1ccc(F)cc1', phase: 'l' as const }, IPA: { name: 'isopropanol', phase: 'l' as const }, alcohol: { smiles: 'C[C@@H](O)c1ccc(F)cc1', phase: 'l' as const } };
    const saved = await saveRoute({
      teamId, userId, routeId: route.id,
      input: {
        version: route.version, name: route.name, target: 'acetone(l)', targetAmount: '1 mol', marginalThreshold_kJ: -17,
        steps: [{ id: 'reduce', equation: 'ketone + IPA -> alcohol + acetone(l)', species, temperature: '303 K', yieldPct: 100, notes: '', position: { x: 0, y: 0 } }],
        links: [],
      },
    });
    expect(saved.route.steps[0]?.species, JSON.stringify(saved)).toEqual(species);
    const res = await callRoute(evaluateSavedRoute, { method: 'POST', userId, params: { routeId: String(route.id) } });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const body = res.body as { evaluation?: { steps: { result: { species: { as_written: string; origin: string }[] } | null }[] } };
    expect(body.evaluation, JSON.stringify(res.body).slice(0, 400)).toBeDefined();
    const step = body.evaluation!.steps[0]!;
    expect(Object.fromEntries(step.result!.species.map((s) => [s.as_written, s.origin]))).toEqual({ ketone: 'estimated', IPA: 'library', alcohol: 'estimated', 'acetone(l)': 'library' });
    const file = await callRoute(exportRoute, { userId, params: { routeId: String(route.id) } });
    expect((file.body as { steps: { species?: unknown }[] }).steps[0]!.species).toEqual(species);
  });
});

describe('POST /api/balance with a step’s species map', () => {
  it('reads the step’s labels, and answers a bad definition as an error item, never a 500', async () => {
    const species = { NB: { name: 'nitrobenzene', phase: 'l' }, AN: { smiles: 'Nc1ccccc1', phase: 'l' } };
    const ok = await callRoute(balance, { method: 'POST', userId, body: { equation: 'NB + 3 H2(g) -> AN + 2 H2O(l)', species } });
    expect(ok.status, JSON.stringify(ok.body)).toBe(200);
    expect(ok.body).toMatchObject({ isBalanced: true });
    // One-click balance writes the labels back as typed, never the structures' "{InChIKey}(l)" keys.
    const unbalanced = await callRoute(balance, { method: 'POST', userId, body: { equation: 'NB + H2(g) -> AN + H2O(l)', species } });
    expect(unbalanced.body).toMatchObject({ isBalanced: false, balanced: 'NB + 3 H2(g) ⇌ AN + 2 H2O(l)' });
    const bad = await callRoute(balance, { method: 'POST', userId, body: { equation: 'NB -> AN', species: { NB: { smiles: 'C1CC', phase: 'l' }, AN: { smiles: 'Nc1ccccc1', phase: 'l' } } } });
    expect(bad.status).toBe(200);
    expect(bad.body).toMatchObject({ error: { code: 'INVALID_STRUCTURE' } });
  });
});
