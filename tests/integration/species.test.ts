import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import * as evaluateRoute from '@/app/api/evaluate/route';
import * as routeEvaluate from '@/app/api/routes/[routeId]/evaluate/route';
import * as speciesDetail from '@/app/api/species/[key]/route';
import * as impactRoute from '@/app/api/species/impact/route';
import * as speciesRoute from '@/app/api/species/route';
import * as teamSpeciesRoute from '@/app/api/species/team/[teamSpeciesId]/route';
import { getDb } from '@/db';
import { builtinLookup } from '@/lib/thermo/species-library';
import { saveRoute } from '@/lib/services/routes/save-route';
import { makeRoleSet, makeRoute, SAMPLE_STEPS } from './support/fixtures';
import { callRoute, errorOf } from './support/http';
import { speciesInput } from './support/species-fixtures';
import { setupTestDb, teardownTestDb } from './support/test-db';

type World = Awaited<ReturnType<typeof makeRoleSet>>;
let dir = '';
let w: World;

beforeAll(async () => {
  ({ dir } = await setupTestDb());
  w = await makeRoleSet();
});
afterAll(async () => teardownTestDb(dir));

// An estimated methanol vapour row, deliberately 4.34 kJ/mol below NBS 1982's ΔfH° (−200.66) so every use of it shows.
const methanol = { formula: 'CH3OH', phase: 'g' as const, name: 'methanol (team estimate)', dfH: -205, dfG: null, S: 239.81, provenance: { kind: 'estimated' as const, method: 'Kestrel Ridge group additivity, sheet 4' } };

describe('species library list', () => {
  it('searches formula, name and alias, filters phase and origin, and pages on the server', async () => {
    const res = await callRoute(speciesRoute.GET, { userId: w.reviewerId, path: '/api/species?q=water' });
    expect(res.status).toBe(200);
    const body = res.body as { items: { key: string; origin: string }[]; total: number };
    expect(body.items.map((i) => i.key)).toEqual(expect.arrayContaining(['H2O(l)', 'H2O(g)']));
    const liquid = (await callRoute(speciesRoute.GET, { userId: w.reviewerId, path: '/api/species?q=H2O&phase=l' })).body as { items: { key: string }[] };
    expect(liquid.items.map((i) => i.key)).toContain('H2O(l)');
    expect(liquid.items.map((i) => i.key)).not.toContain('H2O(g)');
    const page1 = (await callRoute(speciesRoute.GET, { userId: w.reviewerId, path: '/api/species?pageSize=10&page=1' })).body as { items: { key: string }[]; total: number };
    const page2 = (await callRoute(speciesRoute.GET, { userId: w.reviewerId, path: '/api/species?pageSize=10&page=2' })).body as { items: { key: string }[] };
    expect(page1.items).toHaveLength(10);
    expect(page1.total).toBeGreaterThan(100);
    expect(page2.items[0]!.key).not.toBe(page1.items[0]!.key);
  });

  it('caps the page size with a 400 in the standard shape', async () => {
    const res = await callRoute(speciesRoute.GET, { userId: w.reviewerId, path: '/api/species?pageSize=1000' });
    expect(res.status).toBe(400);
    expect(errorOf(res.body).fields?.pageSize).toMatch(/At most 100/);
  });
});

describe('team species', () => {
  let methanolId = 0;

  it('refuses a species without provenance, with field messages', async () => {
    const res = await callRoute(speciesRoute.POST, { method: 'POST', userId: w.designerId, body: { ...methanol, provenance: { kind: 'citation', citation: '' } } });
    expect(res.status).toBe(400);
    expect(errorOf(res.body).fields?.['provenance.citation']).toMatch(/citation/);
  });

  it('refuses ΔfG° that disagrees with ΔfH° − TΔfS° by more than 0.5 kJ/mol', async () => {
    const res = await callRoute(speciesRoute.POST, { method: 'POST', userId: w.designerId, body: { ...methanol, dfG: -150 } });
    expect(res.status).toBe(400);
    expect(errorOf(res.body).fields?.dfG).toMatch(/differs from ΔfH° − T·ΔfS°/);
  });

  it('creates an override of a built-in, derives ΔfG°, and is marked in the list', async () => {
    const res = await callRoute(speciesRoute.POST, { method: 'POST', userId: w.designerId, body: methanol });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const made = res.body as { id: number; key: string; dfG_kJ: number; dfGDerived: boolean; overridesBuiltin: boolean };
    methanolId = made.id;
    expect(made).toMatchObject({ key: 'CH3OH(g)', dfGDerived: true, overridesBuiltin: true });
    // Same entropy as the built-in row, so ΔfG° moves by exactly the ΔfH° change (−4.34 kJ/mol) up to the NBS rounding.
    expect(made.dfG_kJ - builtinLookup.get('CH3OH(g)')!.dfG_kJ).toBeCloseTo(-4.34, 1);
    const list = (await callRoute(speciesRoute.GET, { userId: w.reviewerId, path: '/api/species?q=CH3OH&phase=g' })).body as { items: { origin: string; overridesBuiltin: boolean; shadowedByTeam: boolean }[] };
    expect(list.items).toEqual(expect.arrayContaining([
      expect.objectContaining({ origin: 'team', overridesBuiltin: true }),
      expect.objectContaining({ origin: 'library', shadowedByTeam: true }),
    ]));
    const again = await callRoute(speciesRoute.POST, { method: 'POST', userId: w.leadId, body: methanol });
    expect(again.status).toBe(409);
  });

  it('is used by this team’s evaluations only, which say whose value was used', async () => {
    const body = { equation: 'CO(g) + 2 H2(g) -> CH3OH(g)' };
    const mine = (await callRoute(evaluateRoute.POST, { method: 'POST', userId: w.reviewerId, body })).body as { deltaG0_kJ: number; species: { key: string; origin: string; override: boolean; source: string }[]; warnings: { code: string }[] };
    const theirs = (await callRoute(evaluateRoute.POST, { method: 'POST', userId: w.foreignId, body })).body as typeof mine;
    expect(mine.deltaG0_kJ - theirs.deltaG0_kJ).toBeCloseTo(-4.34, 1);
    expect(mine.species.find((s) => s.key === 'CH3OH(g)')).toMatchObject({ origin: 'team', override: true, source: 'Estimated (Kestrel Ridge group additivity, sheet 4)' });
    expect(mine.warnings.map((x) => x.code)).toContain('OVERRIDE');
    expect(theirs.species.find((s) => s.key === 'CH3OH(g)')).toMatchObject({ origin: 'library', override: false, source: 'NBS 1982' });
    expect(theirs.warnings.map((x) => x.code)).not.toContain('OVERRIDE');
  });

  it('a new key exists for its team and is unknown to another', async () => {
    const input = speciesInput();
    const made = (await callRoute(speciesRoute.POST, { method: 'POST', userId: w.leadId, body: input })).body as { key: string };
    const equation = `${made.key.replace('(g)', '(l)')} -> ${made.key}`;
    expect((await callRoute(speciesRoute.POST, { method: 'POST', userId: w.leadId, body: { ...input, phase: 'l', S: 300 } })).status).toBe(201);
    expect((await callRoute(evaluateRoute.POST, { method: 'POST', userId: w.designerId, body: { equation } })).status).toBe(200);
    const foreign = await callRoute(evaluateRoute.POST, { method: 'POST', userId: w.foreignId, body: { equation } });
    expect(foreign.status).toBe(400);
    expect(errorOf(foreign.body).code).toBe('UNKNOWN_SPECIES');
  });

  it('shows detail with uncertainty, source, series over the data range and the routes using it', async () => {
    const route = await makeRoute(w.teamId, w.leadId);
    const res = await callRoute(speciesDetail.GET, { userId: w.reviewerId, params: { key: 'CH3OH(g)' } });
    expect(res.status).toBe(200);
    const d = res.body as { inUse: string; team: { provenance: { kind: string } }; builtin: { source: string }; series: { range_K: number[]; points: { T_K: number; dfG_kJ: number }[] }; builtinSeries: unknown; routes: { routeId: number; stepKeys: string[] }[] };
    expect(d.inUse).toBe('team');
    expect(d.team.provenance.kind).toBe('estimated');
    expect(d.builtin.source).toBe('NBS 1982');
    expect(d.builtinSeries).not.toBeNull();
    expect(d.series.range_K).toEqual([198.15, 398.15]); // no Cp° given: our convention, 298.15 ± 100 K
    expect(d.routes).toEqual([expect.objectContaining({ routeId: route.id, stepKeys: ['s2'] })]);
    // s2 follows s1 along the links, so it is Step 2; the page names it so, never by its key.
    expect((d.routes[0] as unknown as { steps: unknown[] }).steps).toEqual([{ number: 2, equation: 'CO(g) + 2 H2(g) -> CH3OH(g)', label: 'Step 2 (methanol from carbon monoxide)' }]);
    // A route saved since is seen at once (the usage index follows the team's routes).
    const later = await makeRoute(w.teamId, w.leadId);
    const again = (await callRoute(speciesDetail.GET, { userId: w.reviewerId, params: { key: 'CH3OH(g)' } })).body as typeof d;
    expect(again.routes.map((r) => r.routeId).sort()).toEqual([route.id, later.id].sort());
    // So is an edit moments later that takes methanol out: same route count and ids, maybe the same second.
    await saveRoute({
      teamId: w.teamId, userId: w.leadId, routeId: later.id,
      input: { version: later.version, name: later.name, target: 'CO(g)', targetAmount: '1 mol', marginalThreshold_kJ: -17, steps: [SAMPLE_STEPS[0]!], links: [] },
    });
    const edited = (await callRoute(speciesDetail.GET, { userId: w.reviewerId, params: { key: 'CH3OH(g)' } })).body as typeof d;
    expect(edited.routes.map((r) => r.routeId)).toEqual([route.id]);
    const foreign = (await callRoute(speciesDetail.GET, { userId: w.foreignId, params: { key: 'CH3OH(g)' } })).body as { inUse: string; routes: unknown[] };
    expect(foreign).toMatchObject({ inUse: 'library', routes: [] });
    expect((await callRoute(speciesDetail.GET, { userId: w.reviewerId, params: { key: 'Xx9(g)' } })).status).toBe(404);
  });

  it('previews and then reports which routes’ ΔG change on an edit', async () => {
    const route = await makeRoute(w.teamId, w.leadId);
    const edited = { ...methanol, dfH: -210 };
    const preview = await callRoute(impactRoute.POST, { method: 'POST', userId: w.designerId, body: { species: edited, teamSpeciesId: methanolId } });
    expect(preview.status).toBe(200);
    const impact = (preview.body as { impact: { routeId: number; steps: { stepKey: string; before_kJ: number; after_kJ: number }[] }[] }).impact;
    const mine = impact.find((r) => r.routeId === route.id)!;
    expect(mine.steps.map((s) => s.stepKey)).toEqual(['s2']); // s1 has no methanol
    expect(mine.steps[0]!.after_kJ - mine.steps[0]!.before_kJ).toBeCloseTo(-5, 6);

    const current = (await callRoute(teamSpeciesRoute.GET, { userId: w.reviewerId, params: { teamSpeciesId: String(methanolId) } })).body as { version: number };
    const put = await callRoute(teamSpeciesRoute.PUT, { method: 'PUT', userId: w.designerId, params: { teamSpeciesId: String(methanolId) }, body: { version: current.version, species: edited } });
    expect(put.status, JSON.stringify(put.body)).toBe(200);
    const answer = put.body as { species: { version: number; dfH_kJ: number }; impact: { routeId: number }[] };
    expect(answer.species).toMatchObject({ version: current.version + 1, dfH_kJ: -210 });
    expect(answer.impact.map((r) => r.routeId)).toContain(route.id);

    // The saved route now evaluates with the edited value.
    const evaluated = (await callRoute(routeEvaluate.POST, { method: 'POST', userId: w.reviewerId, params: { routeId: String(route.id) } })).body as { evaluation: { steps: { id: string; result: { species: { key: string; origin: string; sourceRef: string }[] } }[] } };
    const s2 = evaluated.evaluation.steps.find((s) => s.id === 's2')!;
    expect(s2.result.species.find((s) => s.key === 'CH3OH(g)')).toMatchObject({ origin: 'team', sourceRef: `team species #${methanolId}, version ${current.version + 1}` });

    const stale = await callRoute(teamSpeciesRoute.PUT, { method: 'PUT', userId: w.leadId, params: { teamSpeciesId: String(methanolId) }, body: { version: current.version, species: edited } });
    expect(stale.status).toBe(409);
  });

  it('answers 404 to a measured value that names another team’s fit, on create and on edit', async () => {
    const { Fit, TeamSpecies } = getDb().models;
    const fitOf = (teamId: number) => Fit.create({
      teamId, dataSetId: null, name: 'K(T) of the dimerisation', equation: '2 NO2(g) -> N2O4(g)', rawData: {} as never, result: {} as never,
      deltaH0Kj: -57.2, deltaS0JPerK: -175.8, createdById: null,
    });
    const foreignFit = await fitOf(w.foreignTeamId);
    const ownFit = await fitOf(w.teamId);
    const measured = (fitId: number) => speciesInput({ provenance: { kind: 'measured', reference: 'Notebook KR-12, p. 4', fitId } });
    const before = await TeamSpecies.count({ where: { teamId: w.teamId } });
    const created = await callRoute(speciesRoute.POST, { method: 'POST', userId: w.designerId, body: measured(foreignFit.id) });
    expect(created.status).toBe(404);
    expect(errorOf(created.body).code).toBe('NOT_FOUND');
    expect(await TeamSpecies.count({ where: { teamId: w.teamId } })).toBe(before);

    const own = await callRoute(speciesRoute.POST, { method: 'POST', userId: w.designerId, body: measured(ownFit.id) });
    expect(own.status, JSON.stringify(own.body)).toBe(201);
    const id = (own.body as { id: number }).id;
    const input = measured(foreignFit.id);
    const edited = await callRoute(teamSpeciesRoute.PUT, { method: 'PUT', userId: w.designerId, params: { teamSpeciesId: String(id) }, body: { version: 1, species: input } });
    expect(edited.status).toBe(404);
    expect((await TeamSpecies.findByPk(id))!.fitId).toBe(ownFit.id);
  });

  it('hides another team’s species behind 404', async () => {
    expect((await callRoute(teamSpeciesRoute.GET, { userId: w.foreignId, params: { teamSpeciesId: String(methanolId) } })).status).toBe(404);
    const put = await callRoute(teamSpeciesRoute.PUT, { method: 'PUT', userId: w.foreignId, params: { teamSpeciesId: String(methanolId) }, body: { version: 1, species: methanol } });
    expect(put.status).toBe(404);
    const preview = await callRoute(impactRoute.POST, { method: 'POST', userId: w.foreignId, body: { species: methanol, teamSpeciesId: methanolId } });
    expect(preview.status).toBe(404);
    expect(await getDb().models.TeamSpecies.count({ where: { teamId: w.foreignTeamId } })).toBe(0);
  });
});
