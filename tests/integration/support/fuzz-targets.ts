// What the endpoint fuzz needs per handler: path parameters (by name) and one valid body to mutate.
import { getDb } from '@/db';
import { newInvitationToken } from '@/lib/services/invitations/token';
import { makeDataSet, makeFit } from './fit-fixtures';
import { addMember, makeRoute, makeTeamWithLead, SAMPLE_LINKS, SAMPLE_STEPS } from './fixtures';

export interface FuzzWorld {
  teamId: number;
  leadId: number;
  reviewerId: number;
}

type Params = Record<string, string>;
type ParamMaker = (w: FuzzWorld, sofar: Params) => Promise<string>;

let seq = 0;
const unique = () => `${Date.now()}-${(seq += 1)}`;

async function invitation(w: FuzzWorld) {
  const { token, tokenHash } = newInvitationToken();
  const row = await getDb().models.Invitation.create({
    teamId: w.teamId, email: `fuzz-invitee-${unique()}@example.test`, role: 'reviewer', tokenHash, invitedById: w.leadId, expiresAt: new Date(Date.now() + 86_400_000),
  });
  return { token, id: row.id };
}

// Filled in path order, so a comment or flag lands on the route made for the same handler.
const PARAM_MAKERS: Record<string, ParamMaker> = {
  teamId: async (w) => String(w.teamId),
  routeId: async (w) => String((await makeRoute(w.teamId, w.leadId)).id),
  userId: async (w) => String(await addMember(w.teamId, 'reviewer')),
  revisionId: async (_w, p) => {
    const revision = await getDb().models.RouteRevision.findOne({ where: { routeId: Number(p.routeId) }, order: [['version', 'ASC']] });
    return String(revision!.id);
  },
  commentId: async (w, p) => {
    const { createComment } = await import('@/lib/services/comments/create-comment');
    const comment = await createComment({ teamId: w.teamId, routeId: Number(p.routeId), userId: w.leadId, input: { body: 'Fuzz target.', stepKey: 's1' } });
    return String(comment.id);
  },
  flagId: async (w, p) => {
    const { createFlag } = await import('@/lib/services/flags/create-flag');
    const flag = await createFlag({ teamId: w.teamId, routeId: Number(p.routeId), userId: w.leadId, input: { stepKey: 's2', category: 'cost', reason: 'Fuzz target.' } });
    return String(flag.id);
  },
  driverId: async (w) => {
    const { createDriver } = await import('@/lib/services/drivers/create-driver');
    const driver = await createDriver({ teamId: w.teamId, userId: w.leadId, input: { name: `Fuzz ${unique()}`, equation: 'CO(g) + 1/2 O2(g) -> CO2(g)', basis: '' } });
    return String(driver.id);
  },
  invitationId: async (w) => String((await invitation(w)).id),
  token: async (w) => (await invitation(w)).token,
  dataSetId: async (w) => String((await makeDataSet(w.teamId, w.leadId)).id),
  fitId: async (w) => String((await makeFit(w.teamId, w.leadId)).id),
  teamSpeciesId: async (w) => {
    const { createTeamSpecies } = await import('@/lib/services/species/create-team-species');
    return String((await createTeamSpecies({ teamId: w.teamId, userId: w.leadId, input: speciesInput() })).id);
  },
  key: async () => 'H2O(g)',
  // These handlers take the team from the session and parse the body before the lookup, so a missing id still fuzzes the body.
  importId: async () => '987654321',
  decisionId: async (w) => {
    const { recordDecision } = await import('@/lib/services/decisions/record-decision');
    const [a, b] = [await makeRoute(w.teamId, w.leadId), await makeRoute(w.teamId, w.leadId)];
    const { decision } = await recordDecision({ teamId: w.teamId, userId: w.leadId, role: 'lead', input: { routeIds: [a.id, b.id], chosenRouteId: a.id, rationale: 'Fuzz.', shelveOthers: false } });
    return String(decision.id);
  },
};

export function paramNames(route: string): string[] {
  return [...route.matchAll(/\[(\w+)\]/g)].map((m) => m[1]!);
}

/** Names a handler's path needs that no maker fills: the fuzz test fails listing them. */
export function missingParamMakers(route: string): string[] {
  return paramNames(route).filter((name) => !PARAM_MAKERS[name]);
}

export async function makeParams(route: string, w: FuzzWorld): Promise<Params> {
  const params: Params = {};
  for (const name of paramNames(route)) {
    const maker = PARAM_MAKERS[name];
    if (!maker) throw new Error(`No maker for the path parameter [${name}] of ${route}: add one to PARAM_MAKERS in tests/integration/support/fuzz-targets.ts`);
    params[name] = await maker(w, params);
  }
  return params;
}

type SeedBody = (w: FuzzWorld, params: Params) => Promise<unknown> | unknown;

// A fuzz input only: made-up values, not reference data. The formula varies so a team can hold several.
const speciesInput = () => ({
  formula: `C${10 + (seq += 1)}H8O4`, phase: 's' as const, name: `Fuzz solid ${unique()}`, dfH: -500, S: 200, provenance: { kind: 'estimated' as const, method: 'Fuzz input, not a measurement' },
});

const steps = SAMPLE_STEPS.map((s) => ({ ...s }));
const draft = { name: 'Fuzz draft', target: 'CH3OH(g)', targetAmount: '1 mol', marginalThreshold_kJ: -17, steps, links: SAMPLE_LINKS };
const routeVersion = async (p: Params) => (await getDb().models.Route.findByPk(Number(p.routeId)))!.version;

// Valid bodies to mutate, keyed "METHOD route". A JSON handler without one is fuzzed with generic bodies only.
export const SEED_BODIES: Record<string, SeedBody> = {
  'POST evaluate': () => ({ equation: 'H2(g) + 1/2 O2(g) -> H2O(l)', temperature: '500 K', pressures: { 'H2(g)': '2 bar' } }),
  'POST balance': () => ({ equation: 'H2(g) + O2(g) -> H2O(l)' }),
  'POST fit': () => ({ points: [{ temperature: '500 K', lnK: 2 }, { temperature: '600 K', lnK: 1 }, { temperature: '700 K', lnK: 0.3 }] }),
  'POST drivers': () => ({ name: 'Hydrogen burn', equation: 'H2(g) + 1/2 O2(g) -> H2O(l)' }),
  'POST routes': () => ({ name: 'New', target: 'NH3(g)', targetAmount: '1 mol' }),
  'PUT routes/[routeId]': async (_w, p) => ({ version: await routeVersion(p), ...draft }),
  'POST routes/[routeId]/duplicate': () => ({ name: 'Copy' }),
  'POST routes/[routeId]/archive': () => ({ archived: true }),
  'POST routes/[routeId]/evaluate': () => draft,
  'POST routes/[routeId]/revisions/[revisionId]/restore': async (_w, p) => ({ version: await routeVersion(p) }),
  'POST routes/[routeId]/transitions': async (w, p) => ({ to: 'in_review', version: await routeVersion(p), reviewerIds: [w.reviewerId] }),
  'POST signup': () => ({ name: 'New Person', email: `fuzz-${unique()}@example.test`, password: 'long-enough-pass', teamName: 'New team' }),
  'PATCH me/preferences': () => ({ energyUnit: 'kcal', temperatureUnit: 'degC', pressureUnit: 'atm' }),
  'PUT me/active-team': (w) => ({ teamId: w.teamId }),
  'PATCH teams/[teamId]/members/[userId]': () => ({ role: 'designer' }),
  'POST teams/[teamId]/invitations': () => ({ email: `fuzz-inv-${unique()}@example.test`, role: 'reviewer' }),
  'POST invitations/[token]/accept': () => ({ name: 'Invitee', password: 'long-enough-pass' }),
  'POST routes/[routeId]/comments': () => ({ body: 'Check the pressure on s1.', stepKey: 's1' }),
  'PATCH routes/[routeId]/comments/[commentId]': () => ({ body: 'Edited.' }),
  'POST routes/[routeId]/comments/[commentId]/resolve': () => ({ resolved: true }),
  'POST routes/[routeId]/flags': () => ({ stepKey: 's1', category: 'safety', reason: 'Hot hydrogen at 1100 K.' }),
  'POST routes/[routeId]/flags/[flagId]/clear': () => ({ comment: 'Priced a cheaper catalyst.' }),
  'POST notifications/read': () => ({ all: true }),
  'POST password-reset': () => ({ email: `fuzz-reset-${unique()}@example.test` }),
  'POST password-reset/[token]': () => ({ password: 'a-new-long-password' }),
  'POST decisions': async (w) => {
    const [a, b] = [await makeRoute(w.teamId, w.leadId), await makeRoute(w.teamId, w.leadId)];
    return { routeIds: [a.id, b.id], chosenRouteId: a.id, rationale: 'Fewer uphill steps.' };
  },
  'POST fits/data-sets': () => ({ name: 'Typed set', source: 'grid', rows: [{ T: '300', value: '2' }, { T: '400', value: '5' }, { T: '500', value: '9' }] }),
  'PUT fits/data-sets/[dataSetId]': () => ({ name: 'Renamed', rows: [{ T: '300', value: '2' }, { T: '400', value: '5' }, { T: '500', value: '9' }] }),
  'PUT fits/data-sets/[dataSetId]/exclusions': () => ({ exclusions: [{ index: 0, reason: 'Thermostat drifted.' }] }),
  'POST fits': async (w) => ({ dataSetId: (await makeDataSet(w.teamId, w.leadId)).id, name: 'Saved' }),
  'POST fits/[fitId]/species': () => ({ species: 'NO2(g)', name: 'Nitrogen dioxide (fitted)' }),
  'POST species': () => speciesInput(),
  'PUT species/team/[teamSpeciesId]': () => ({ version: 1, species: speciesInput() }),
  'POST species/impact': () => ({ species: speciesInput() }),
  'POST species/resolve': () => ({ smiles: 'CC(=O)Nc1ccc(O)cc1', phase: 'g', temperature: '350 K' }),
  // A structure no library row has (a Boc-protected amino alcohol), saved as the engine's estimate.
  'POST species/team': () => ({ smiles: 'CC(C)(C)OC(=O)NC(C)(C)CO', phase: 'g', name: `fuzz estimate ${unique()}`, source: { kind: 'estimate' } }),
  'POST species/imports/[importId]/commit': () => ({ choices: { 'C9H8O4(s)': 'skip' }, otherwise: 'override' }),
  // Another team's export, with one route: the caller's team holds no data yet, so the import may succeed once.
  'POST teams/[teamId]/import': async () => {
    const { exportTeam } = await import('@/lib/services/team-transfer/export-team');
    const source = await makeTeamWithLead('fuzz-export');
    await makeRoute(source.teamId, source.leadId);
    return exportTeam({ teamId: source.teamId });
  },
  'POST routes/import': () => ({
    target: 'NH3(g)', steps: [{ id: 'a', equation: 'N2(g) + 3 H2(g) -> 2 NH3(g)', temperature: '700 K' }], stepwell: { format: 'stepwell.route/1', name: 'Imported ammonia' },
  }),
};
