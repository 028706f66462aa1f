// Data sets, fits, exclusions, species from a fit, and a route step that takes its ΔH° and ΔS° from a saved fit.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { getDb } from '@/db';
import * as dataSets from '@/app/api/fits/data-sets/route';
import * as dataSet from '@/app/api/fits/data-sets/[dataSetId]/route';
import * as analysis from '@/app/api/fits/data-sets/[dataSetId]/analysis/route';
import * as exclusions from '@/app/api/fits/data-sets/[dataSetId]/exclusions/route';
import * as fits from '@/app/api/fits/route';
import * as fitSpecies from '@/app/api/fits/[fitId]/species/route';
import * as routeOne from '@/app/api/routes/[routeId]/route';
import * as routeEvaluate from '@/app/api/routes/[routeId]/evaluate/route';
import { builtinLookup } from '@/lib/thermo/species-library';
import { makeRoleSet, makeRoute } from './support/fixtures';
import { makeFit, N2O4_DH_KJ, N2O4_DS_J, N2O4_EQUATION, n2o4Csv } from './support/fit-fixtures';
import { callRoute } from './support/http';
import { setupTestDb, teardownTestDb } from './support/test-db';

type World = Awaited<ReturnType<typeof makeRoleSet>>;
let dir = '';
let w: World;
const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);
const body = <T>(res: { body: unknown }) => res.body as T;

beforeAll(async () => {
  ({ dir } = await setupTestDb());
  w = await makeRoleSet();
});
afterAll(async () => teardownTestDb(dir));

const create = (input: Record<string, unknown>, userId = w.designerId) =>
  callRoute(dataSets.POST, { method: 'POST', userId, body: { name: 'Dissociation, KR-7', equation: N2O4_EQUATION, ...input } });
const setCount = () => getDb().models.FitDataSet.count({ where: { teamId: w.teamId } });

describe('data sets', () => {
  it('a CSV upload is stored as sent and fits back to the values it was made from (1e-9 relative)', async () => {
    const res = await create({ source: 'csv', text: n2o4Csv() });
    expect(res.status).toBe(201);
    const set = body<{ id: number; points: unknown[]; equation: string }>(res);
    expect(set.points).toHaveLength(5);
    const a = await callRoute(analysis.GET, { userId: w.reviewerId, params: { dataSetId: String(set.id) } });
    expect(a.status).toBe(200);
    const { result } = body<{ result: { deltaH0_kJ: number; deltaS0_J_per_K: number; n: number } }>(a);
    expect(rel(result.deltaH0_kJ, N2O4_DH_KJ)).toBeLessThan(1e-9);
    expect(rel(result.deltaS0_J_per_K, N2O4_DS_J)).toBeLessThan(1e-9);
  });

  it('one bad cell refuses the whole set with a message on that cell, and nothing is stored', async () => {
    const before = await setCount();
    const res = await create({ source: 'paste', text: '300,1.2\n350,abc\n400,3.1\n450,-2' });
    expect(res.status).toBe(400);
    const { error } = body<{ error: { code: string; fields: Record<string, string> } }>(res);
    expect(error.code).toBe('VALIDATION');
    expect(error.fields['rows.1.value']).toMatch(/Row 2.*not a number/);
    expect(error.fields['rows.3.value']).toMatch(/above 0/);
    expect(await setCount()).toBe(before);
  });

  it('refuses text that is not UTF-8, too few points, one temperature, and an unbalanced reaction', async () => {
    expect((await create({ source: 'csv', text: 'T,K\n300,1\uFFFD2' })).status).toBe(400);
    const two = await create({ source: 'grid', rows: [{ T: '300', value: '1' }, { T: '400', value: '2' }] });
    expect(body<{ error: { fields: Record<string, string> } }>(two).error.fields.rows).toMatch(/at least 3/);
    const same = await create({ source: 'grid', rows: [{ T: '300', value: '1' }, { T: '300', value: '2' }, { T: '300', value: '3' }] });
    expect(body<{ error: { fields: Record<string, string> } }>(same).error.fields.rows).toMatch(/one temperature/);
    const unbalanced = await create({ source: 'csv', text: n2o4Csv(), equation: 'N2O4(g) -> NO2(g)' });
    expect(body<{ error: { fields: Record<string, string> } }>(unbalanced).error.fields.equation).toMatch(/not balanced/);
  });

  it('a reviewer reads but cannot write; another team sees 404', async () => {
    const res = await create({ source: 'csv', text: n2o4Csv() }, w.reviewerId);
    expect(res.status).toBe(403);
    const mine = body<{ id: number }>(await create({ source: 'csv', text: n2o4Csv() }));
    expect((await callRoute(dataSet.GET, { userId: w.foreignId, params: { dataSetId: String(mine.id) } })).status).toBe(404);
    expect((await callRoute(exclusions.PUT, { method: 'PUT', userId: w.foreignId, params: { dataSetId: String(mine.id) }, body: { exclusions: [] } })).status).toBe(404);
  });
});

describe('exclusions and saved fits', () => {
  it('an excluded point keeps its reason, leaves the fit, and the saved fit keeps its raw data through later edits', async () => {
    const csv = n2o4Csv([280, 290, 300, 310, 320, 330]).replace(/\n300,[^\n]+/, '\n300,5.0');
    const set = body<{ id: number }>(await create({ source: 'csv', text: csv }));
    const params = { dataSetId: String(set.id) };
    const marked = body<{ points: { outlier: boolean; index: number }[]; result: { n: number } }>(await callRoute(analysis.GET, { userId: w.leadId, params }));
    expect(marked.result.n).toBe(6);

    const ex = await callRoute(exclusions.PUT, { method: 'PUT', userId: w.designerId, params, body: { exclusions: [{ index: 2, reason: 'Cell not yet at temperature.' }] } });
    expect(ex.status).toBe(200);
    expect(body<{ points: { excluded: boolean; reason: string | null }[] }>(ex).points[2]).toMatchObject({ excluded: true, reason: 'Cell not yet at temperature.' });
    const after = body<{ result: { n: number; deltaH0_kJ: number } }>(await callRoute(analysis.GET, { userId: w.leadId, params }));
    expect(after.result.n).toBe(5);
    expect(rel(after.result.deltaH0_kJ, N2O4_DH_KJ)).toBeLessThan(1e-9);

    const saved = await callRoute(fits.POST, { method: 'POST', userId: w.designerId, body: { dataSetId: set.id, name: 'N2O4 without the cold point' } });
    expect(saved.status).toBe(201);
    const fit = body<{ id: number; rawData: { points: { excluded: boolean; reason: string | null }[] }; result: { n: number } }>(saved);
    expect(fit.result.n).toBe(5);
    expect(fit.rawData.points[2]!.reason).toBe('Cell not yet at temperature.');

    const edit = await callRoute(dataSet.PUT, {
      method: 'PUT', userId: w.designerId, params,
      body: { name: 'Edited', rows: [{ T: '300', value: '1' }, { T: '400', value: '2' }, { T: '500', value: '3' }] },
    });
    expect(edit.status).toBe(200);
    const row = await getDb().models.Fit.findByPk(fit.id);
    expect(row!.rawData.points).toHaveLength(6);
    expect((await callRoute(dataSet.DELETE, { method: 'DELETE', userId: w.leadId, params })).status).toBe(409);
  });
});

describe('a species from a fit, and a step on a fit', () => {
  it('solves NO2(g) from the fit and N2O4(g) of the library, with provenance pointing back to the fit', async () => {
    const fit = await makeFit(w.teamId, w.leadId);
    const res = await callRoute(fitSpecies.POST, { method: 'POST', userId: w.designerId, params: { fitId: String(fit.id) }, body: { species: 'NO2(g)', name: 'Nitrogen dioxide, KR-7' } });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const row = await getDb().models.TeamSpecies.findOne({ where: { teamId: w.teamId, key: 'NO2(g)' } });
    expect(row!.fitId).toBe(fit.id);
    expect(row!.provenanceKind).toBe('measured');
    expect(row!.provenanceText).toContain(`fit #${fit.id}`);
    // The fixture's reaction values were made from NBS 1982 (ΔfH°(NO2, g) = 33.18 kJ/mol, S° = 240.06 J/(mol K)); the
    // solve takes N2O4(g) from the team's library, where ATcT 1.112's ΔfH° replaced NBS's: ΔfH°(NO2) = (ΔrH° + ΔfH°(N2O4)) / 2.
    const n2o4 = builtinLookup.get('N2O4(g)')!;
    expect(row!.dfhKj).toBeCloseTo((N2O4_DH_KJ + n2o4.dfH_kJ) / 2, 6);
    expect(row!.sJPerK).toBeCloseTo((N2O4_DS_J + n2o4.S_J_per_K) / 2, 6);
    const again = await callRoute(fitSpecies.POST, { method: 'POST', userId: w.designerId, params: { fitId: String(fit.id) }, body: { species: 'NO2(g)', name: 'Twice' } });
    expect(again.status).toBe(409);
    await row!.destroy();
  });

  it('a saved step with fitId is evaluated on the fit, and the answer names it', async () => {
    const fit = await makeFit(w.teamId, w.leadId);
    const route = await makeRoute(w.teamId, w.leadId, false);
    const step = { id: 'd1', equation: N2O4_EQUATION, temperature: '320 K', fitId: fit.id, yieldPct: 100, notes: '', position: { x: 0, y: 0 } };
    const put = (fitId: number) =>
      callRoute(routeOne.PUT, {
        method: 'PUT', userId: w.designerId, params: { routeId: String(route.id) },
        body: { version: route.version, name: route.name, target: 'NO2(g)', targetAmount: '2 mol', marginalThreshold_kJ: -17, steps: [{ ...step, fitId }], links: [] },
      });
    const foreignFit = await makeFit(w.foreignTeamId, w.foreignId);
    const refused = await put(foreignFit.id);
    expect(refused.status).toBe(404);
    expect(body<{ error: { fields: Record<string, string> } }>(refused).error.fields['steps.0.fitId']).toMatch(/No such fit/);

    expect((await put(fit.id)).status).toBe(200);
    const res = await callRoute(routeEvaluate.POST, { method: 'POST', userId: w.reviewerId, params: { routeId: String(route.id) } });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const r = body<{ evaluation: { steps: { result: { deltaG0_kJ: number; override?: { source: string }; warnings: { code: string; message: string }[] } }[] } }>(res).evaluation.steps[0]!.result;
    expect(r.override!.source).toBe(`fit #${fit.id} “${fit.name}”`);
    expect(r.warnings.find((x) => x.code === 'FITTED_VALUES')!.message).toContain(`fit #${fit.id}`);
    expect(r.deltaG0_kJ).toBeCloseTo(N2O4_DH_KJ - (320 * N2O4_DS_J) / 1000, 6);
  });
});
