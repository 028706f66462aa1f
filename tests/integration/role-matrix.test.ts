import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { getDb } from '@/db';
import { newInvitationToken } from '@/lib/services/invitations/token';
import { addMember, makeRoleSet, makeRoute, SAMPLE_LINKS, SAMPLE_STEPS } from './support/fixtures';
import { makeDataSet, makeFit } from './support/fit-fixtures';
import { callRoute, type CallOptions } from './support/http';
import { CSV_HEADER, csvRow, speciesInput, uploadCsv } from './support/species-fixtures';
import { importRoute, listRouteFiles, servedMethods, type HTTP_METHODS } from './support/route-files';
import { setupTestDb, teardownTestDb } from './support/test-db';

type Caller = 'anonymous' | 'reviewer' | 'designer' | 'lead' | 'foreign';
const CALLERS: Caller[] = ['anonymous', 'reviewer', 'designer', 'lead', 'foreign'];
type World = Awaited<ReturnType<typeof makeRoleSet>>;

interface Row {
  route: string;
  method: (typeof HTTP_METHODS)[number];
  expect: Record<Caller, number> | 'next-auth';
  prepare?: (w: World, caller: Caller) => Promise<CallOptions>;
}

const signedIn = (code: number, foreign = code) => ({ anonymous: 401, reviewer: code, designer: code, lead: code, foreign });
const leadOnly = (code: number) => ({ anonymous: 401, reviewer: 403, designer: 403, lead: code, foreign: 404 });
// Writes in the caller's own team: a foreign lead succeeds in theirs.
const editorsOwnTeam = (code: number) => ({ anonymous: 401, reviewer: 403, designer: code, lead: code, foreign: code });
// Writes to a resource of the main team: a foreign caller must not learn it exists.
const editorsOfResource = (code: number) => ({ anonymous: 401, reviewer: 403, designer: code, lead: code, foreign: 404 });
const readersOfResource = (code: number) => ({ anonymous: 401, reviewer: code, designer: code, lead: code, foreign: 404 });
const routeParams = async (w: World) => ({ routeId: String((await makeRoute(w.teamId, w.leadId)).id) });
let seq = 0;
const unique = () => `${Date.now()}-${(seq += 1)}`;

async function pendingInvitation(teamId: number, invitedById: number) {
  const { token, tokenHash } = newInvitationToken();
  const row = await getDb().models.Invitation.create({
    teamId, email: `invitee-${unique()}@example.test`, role: 'reviewer', tokenHash, invitedById, expiresAt: new Date(Date.now() + 86_400_000),
  });
  return { token, id: row.id };
}

async function makeTeamSpecies(w: World) {
  const { createTeamSpecies } = await import('@/lib/services/species/create-team-species');
  return createTeamSpecies({ teamId: w.teamId, userId: w.leadId, input: speciesInput() });
}

// One row per handler and method. A handler without a row fails the coverage test below.
const everyone = (code: number) => ({ anonymous: code, reviewer: code, designer: code, lead: code, foreign: code });

const TABLE: Row[] = [
  // Any /api path no other handler serves: 404 in the error shape for everybody.
  ...(['GET', 'POST', 'PUT', 'PATCH', 'DELETE'] as const).map((method): Row => ({
    route: '[[...path]]', method, expect: everyone(404), prepare: async () => ({ path: '/api/no/such/endpoint', params: { path: 'no/such/endpoint' } }),
  })),
  { route: 'auth/[...nextauth]', method: 'GET', expect: 'next-auth' },
  { route: 'auth/[...nextauth]', method: 'POST', expect: 'next-auth' },
  { route: 'evaluate', method: 'POST', expect: signedIn(200), prepare: async () => ({ body: { equation: 'H2(g) + 1/2 O2(g) -> H2O(l)' } }) },
  {
    route: 'fit', method: 'POST', expect: signedIn(200),
    prepare: async () => ({ body: { points: [{ temperature: '500 K', lnK: 2 }, { temperature: '600 K', lnK: 1 }, { temperature: '700 K', lnK: 0.3 }] } }),
  },
  { route: 'balance', method: 'POST', expect: signedIn(200), prepare: async () => ({ body: { equation: 'H2(g) + O2(g) -> H2O(l)' } }) },
  { route: 'palette', method: 'GET', expect: signedIn(200), prepare: async () => ({ path: '/api/palette?species=H2(g)' }) },
  { route: 'drivers', method: 'GET', expect: signedIn(200) },
  { route: 'drivers', method: 'POST', expect: editorsOwnTeam(201), prepare: async () => ({ body: { name: 'Hydrogen burn', equation: 'H2(g) + 1/2 O2(g) -> H2O(l)' } }) },
  {
    route: 'drivers/[driverId]', method: 'DELETE', expect: editorsOfResource(200),
    prepare: async (w) => {
      const { createDriver } = await import('@/lib/services/drivers/create-driver');
      const driver = await createDriver({ teamId: w.teamId, userId: w.leadId, input: { name: 'CO burn', equation: 'CO(g) + 1/2 O2(g) -> CO2(g)', basis: '' } });
      return { params: { driverId: driver.id } };
    },
  },
  { route: 'routes', method: 'GET', expect: signedIn(200), prepare: async () => ({ path: '/api/routes?sort=name&dir=asc' }) },
  { route: 'routes', method: 'POST', expect: editorsOwnTeam(201), prepare: async () => ({ body: { name: 'New', target: 'NH3(g)', targetAmount: '1 mol' } }) },
  { route: 'routes/[routeId]', method: 'GET', expect: readersOfResource(200), prepare: async (w) => ({ params: await routeParams(w) }) },
  {
    route: 'routes/[routeId]', method: 'PUT', expect: editorsOfResource(200),
    prepare: async (w) => {
      const route = await makeRoute(w.teamId, w.leadId, false);
      return { params: { routeId: String(route.id) }, body: { version: route.version, name: 'Edited', target: 'CH3OH(g)', targetAmount: '1 mol', marginalThreshold_kJ: -17, steps: SAMPLE_STEPS, links: SAMPLE_LINKS } };
    },
  },
  { route: 'routes/[routeId]/duplicate', method: 'POST', expect: editorsOfResource(201), prepare: async (w) => ({ params: await routeParams(w), body: {} }) },
  { route: 'routes/[routeId]/archive', method: 'POST', expect: editorsOfResource(200), prepare: async (w) => ({ params: await routeParams(w), body: { archived: true } }) },
  { route: 'routes/[routeId]/evaluate', method: 'POST', expect: readersOfResource(200), prepare: async (w) => ({ params: await routeParams(w) }) },
  // Revisions, review moves and soft delete: a fresh route per call, so one caller's write never changes the next one's.
  { route: 'routes/[routeId]/revisions', method: 'GET', expect: readersOfResource(200), prepare: async (w) => ({ params: await routeParams(w) }) },
  {
    route: 'routes/[routeId]/revisions/[revisionId]', method: 'GET', expect: readersOfResource(200),
    prepare: async (w) => {
      const route = await makeRoute(w.teamId, w.leadId);
      const revision = await getDb().models.RouteRevision.findOne({ where: { routeId: route.id }, order: [['version', 'DESC']] });
      return { params: { routeId: String(route.id), revisionId: String(revision!.id) } };
    },
  },
  {
    route: 'routes/[routeId]/revisions/compare', method: 'GET', expect: readersOfResource(200),
    prepare: async (w) => {
      const route = await makeRoute(w.teamId, w.leadId);
      const [to, from] = await getDb().models.RouteRevision.findAll({ where: { routeId: route.id }, order: [['version', 'DESC']] });
      return { params: { routeId: String(route.id) }, path: `/api/routes/${route.id}/revisions/compare?from=${from!.id}&to=${to!.id}` };
    },
  },
  {
    route: 'routes/[routeId]/revisions/[revisionId]/restore', method: 'POST', expect: editorsOfResource(200),
    prepare: async (w) => {
      const route = await makeRoute(w.teamId, w.leadId);
      const first = await getDb().models.RouteRevision.findOne({ where: { routeId: route.id }, order: [['version', 'ASC']] });
      return { params: { routeId: String(route.id), revisionId: String(first!.id) }, body: { version: route.version } };
    },
  },
  { route: 'routes/[routeId]/transitions', method: 'GET', expect: readersOfResource(200), prepare: async (w) => ({ params: await routeParams(w) }) },
  {
    // Sending a draft for review: designers and leads; the table refuses a reviewer with 403.
    route: 'routes/[routeId]/transitions', method: 'POST', expect: editorsOfResource(200),
    prepare: async (w) => {
      const route = await makeRoute(w.teamId, w.leadId, false);
      return { params: { routeId: String(route.id) }, body: { to: 'in_review', version: route.version, reviewerIds: [w.reviewerId] } };
    },
  },
  { route: 'routes/[routeId]', method: 'DELETE', expect: editorsOfResource(200), prepare: async (w) => ({ params: await routeParams(w) }) },
  {
    route: 'routes/[routeId]/undelete', method: 'POST', expect: leadOnly(200),
    prepare: async (w) => {
      const route = await makeRoute(w.teamId, w.leadId, false);
      await getDb().models.Route.update({ deletedAt: new Date(), deletedById: w.leadId }, { where: { id: route.id } });
      return { params: { routeId: String(route.id) } };
    },
  },
  { route: 'health', method: 'GET', expect: { anonymous: 200, reviewer: 200, designer: 200, lead: 200, foreign: 200 } },
  {
    route: 'signup', method: 'POST', expect: { anonymous: 201, reviewer: 201, designer: 201, lead: 201, foreign: 201 },
    prepare: async () => ({ body: { name: 'New Person', email: `new-${unique()}@example.test`, password: 'long-enough-pass', teamName: 'New team' } }),
  },
  { route: 'me', method: 'GET', expect: signedIn(200) },
  { route: 'ping', method: 'GET', expect: signedIn(200) },
  { route: 'me/preferences', method: 'PATCH', expect: signedIn(200), prepare: async () => ({ body: { energyUnit: 'kcal', temperatureUnit: 'degC', pressureUnit: 'atm' } }) },
  { route: 'me/active-team', method: 'PUT', expect: signedIn(200, 404), prepare: async (w) => ({ body: { teamId: w.teamId } }) },
  { route: 'teams/[teamId]/members', method: 'GET', expect: signedIn(200, 404), prepare: async (w) => ({ params: { teamId: String(w.teamId) } }) },
  {
    route: 'teams/[teamId]/members/[userId]', method: 'PATCH', expect: leadOnly(200),
    prepare: async (w) => ({ params: { teamId: String(w.teamId), userId: String(await addMember(w.teamId, 'reviewer')) }, body: { role: 'designer' } }),
  },
  {
    route: 'teams/[teamId]/members/[userId]', method: 'DELETE', expect: leadOnly(200),
    prepare: async (w) => ({ params: { teamId: String(w.teamId), userId: String(await addMember(w.teamId, 'reviewer')) } }),
  },
  { route: 'teams/[teamId]/invitations', method: 'GET', expect: leadOnly(200), prepare: async (w) => ({ params: { teamId: String(w.teamId) } }) },
  {
    route: 'teams/[teamId]/invitations', method: 'POST', expect: leadOnly(201),
    prepare: async (w) => ({ params: { teamId: String(w.teamId) }, body: { email: `inv-${unique()}@example.test`, role: 'reviewer' } }),
  },
  {
    route: 'teams/[teamId]/invitations/[invitationId]', method: 'DELETE', expect: leadOnly(200),
    prepare: async (w) => ({ params: { teamId: String(w.teamId), invitationId: String((await pendingInvitation(w.teamId, w.leadId)).id) } }),
  },
  {
    route: 'invitations/[token]', method: 'GET', expect: { anonymous: 200, reviewer: 200, designer: 200, lead: 200, foreign: 200 },
    prepare: async (w) => ({ params: { token: (await pendingInvitation(w.teamId, w.leadId)).token } }),
  },
  {
    // Signed-in callers are not the invited address, so they are refused.
    route: 'invitations/[token]/accept', method: 'POST', expect: { anonymous: 200, reviewer: 403, designer: 403, lead: 403, foreign: 403 },
    prepare: async (w) => ({ params: { token: (await pendingInvitation(w.teamId, w.leadId)).token }, body: { name: 'Invitee', password: 'long-enough-pass' } }),
  },
  // Comments, flags, notifications. A comment is edited or deleted by its own author (the caller; the lead for callers outside the team).
  { route: 'routes/[routeId]/comments', method: 'GET', expect: readersOfResource(200), prepare: async (w) => ({ params: await routeParams(w) }) },
  { route: 'routes/[routeId]/comments', method: 'POST', expect: readersOfResource(201), prepare: async (w) => ({ params: await routeParams(w), body: { body: 'Check the pressure on s1.', stepKey: 's1' } }) },
  ...(['PATCH', 'DELETE'] as const).map((method): Row => ({
    route: 'routes/[routeId]/comments/[commentId]', method, expect: readersOfResource(200),
    prepare: async (w, caller) => {
      const { createComment } = await import('@/lib/services/comments/create-comment');
      const author = { reviewer: w.reviewerId, designer: w.designerId, lead: w.leadId, anonymous: w.leadId, foreign: w.leadId }[caller];
      const params = await routeParams(w);
      const comment = await createComment({ teamId: w.teamId, routeId: Number(params.routeId), userId: author, input: { body: 'Mine.', stepKey: 's2' } });
      return { params: { ...params, commentId: String(comment.id) }, body: method === 'PATCH' ? { body: 'Mine, edited.' } : undefined };
    },
  })),
  {
    route: 'routes/[routeId]/comments/[commentId]/resolve', method: 'POST', expect: readersOfResource(200),
    prepare: async (w) => {
      const { createComment } = await import('@/lib/services/comments/create-comment');
      const params = await routeParams(w);
      const comment = await createComment({ teamId: w.teamId, routeId: Number(params.routeId), userId: w.leadId, input: { body: 'Settle this.' } });
      return { params: { ...params, commentId: String(comment.id) }, body: { resolved: true } };
    },
  },
  { route: 'routes/[routeId]/flags', method: 'GET', expect: readersOfResource(200), prepare: async (w) => ({ params: await routeParams(w) }) },
  { route: 'routes/[routeId]/flags', method: 'POST', expect: readersOfResource(201), prepare: async (w) => ({ params: await routeParams(w), body: { stepKey: 's1', category: 'safety', reason: 'Hot hydrogen at 1100 K.' } }) },
  {
    route: 'routes/[routeId]/flags/[flagId]/clear', method: 'POST', expect: readersOfResource(200),
    prepare: async (w) => {
      const { createFlag } = await import('@/lib/services/flags/create-flag');
      const params = await routeParams(w);
      const flag = await createFlag({ teamId: w.teamId, routeId: Number(params.routeId), userId: w.leadId, input: { stepKey: 's2', category: 'cost', reason: 'Catalyst price.' } });
      return { params: { ...params, flagId: String(flag.id) }, body: { comment: 'Priced a cheaper catalyst.' } };
    },
  },
  { route: 'notifications', method: 'GET', expect: signedIn(200) },
  { route: 'notifications/read', method: 'POST', expect: signedIn(200), prepare: async () => ({ body: { all: true } }) },
  { route: 'routes/[routeId]/activity', method: 'GET', expect: readersOfResource(200), prepare: async (w) => ({ params: await routeParams(w) }) },
  // Compare, decisions and route files. A foreign caller's active team is their own, so the main team's ids are 404 there.
  {
    route: 'compare', method: 'GET', expect: readersOfResource(200),
    prepare: async (w) => ({ path: `/api/compare?ids=${(await makeRoute(w.teamId, w.leadId)).id},${(await makeRoute(w.teamId, w.leadId)).id}` }),
  },
  { route: 'decisions', method: 'GET', expect: signedIn(200) },
  {
    route: 'decisions', method: 'POST', expect: leadOnly(201),
    prepare: async (w) => {
      const [a, b] = [await makeRoute(w.teamId, w.leadId), await makeRoute(w.teamId, w.leadId)];
      return { body: { routeIds: [a.id, b.id], chosenRouteId: a.id, rationale: 'Fewer uphill steps.' } };
    },
  },
  {
    route: 'decisions/[decisionId]', method: 'GET', expect: readersOfResource(200),
    prepare: async (w) => {
      const { recordDecision } = await import('@/lib/services/decisions/record-decision');
      const [a, b] = [await makeRoute(w.teamId, w.leadId), await makeRoute(w.teamId, w.leadId)];
      const { decision } = await recordDecision({ teamId: w.teamId, userId: w.leadId, role: 'lead', input: { routeIds: [a.id, b.id], chosenRouteId: b.id, rationale: 'Cheaper feed.', shelveOthers: false } });
      return { params: { decisionId: String(decision.id) } };
    },
  },
  { route: 'routes/[routeId]/export', method: 'GET', expect: readersOfResource(200), prepare: async (w) => ({ params: await routeParams(w) }) },
  {
    route: 'routes/import', method: 'POST', expect: editorsOwnTeam(201),
    prepare: async () => ({ body: { target: 'NH3(g)', steps: [{ id: 'a', equation: 'N2(g) + 3 H2(g) -> 2 NH3(g)', temperature: '700 K' }], stepwell: { format: 'stepwell.route/1', name: 'Imported ammonia' } } }),
  },
  { route: 'routes/[routeId]/alternatives', method: 'GET', expect: readersOfResource(200), prepare: async (w) => ({ params: await routeParams(w) }) },
  // Species library, team species and CSV imports: each call makes its own species or file, so callers never collide on a key.
  { route: 'species', method: 'GET', expect: signedIn(200), prepare: async () => ({ path: '/api/species?q=water&phase=l&page=1' }) },
  { route: 'species', method: 'POST', expect: editorsOwnTeam(201), prepare: async () => ({ body: speciesInput() }) },
  { route: 'species/[key]', method: 'GET', expect: signedIn(200), prepare: async () => ({ params: { key: 'H2O(l)' } }) },
  { route: 'species/resolve', method: 'GET', expect: signedIn(200), prepare: async () => ({ path: '/api/species/resolve?smiles=CCOC(C)%3DO&phase=l' }) },
  { route: 'species/search', method: 'GET', expect: signedIn(200), prepare: async () => ({ path: '/api/species/search?q=ethanol&limit=5' }) },
  { route: 'structures/svg', method: 'GET', expect: signedIn(200), prepare: async () => ({ path: '/api/structures/svg?smiles=CCO&w=120&h=90' }) },
  { route: 'species/impact', method: 'POST', expect: editorsOwnTeam(200), prepare: async () => ({ body: { species: speciesInput() } }) },
  { route: 'species/team/[teamSpeciesId]', method: 'GET', expect: readersOfResource(200), prepare: async (w) => ({ params: { teamSpeciesId: String((await makeTeamSpecies(w)).id) } }) },
  {
    route: 'species/team/[teamSpeciesId]', method: 'PUT', expect: editorsOfResource(200),
    prepare: async (w) => {
      const made = await makeTeamSpecies(w);
      return { params: { teamSpeciesId: String(made.id) }, body: { version: made.version, species: { ...speciesInput(), notes: 'Edited.' } } };
    },
  },
  {
    route: 'species/team/[teamSpeciesId]', method: 'DELETE', expect: editorsOfResource(200),
    prepare: async (w) => {
      const made = await makeTeamSpecies(w);
      return { params: { teamSpeciesId: String(made.id) }, path: `/api/species/team/${made.id}?version=${made.version}` };
    },
  },
  { route: 'species/resolve', method: 'POST', expect: signedIn(200), prepare: async () => ({ body: { smiles: 'CCOC(C)=O', phase: 'l' } }) },
  {
    // A long n-alkane per call (no library row, entered values), so callers never collide on a structure.
    route: 'species/team', method: 'POST', expect: editorsOwnTeam(201),
    prepare: async () => ({
      body: {
        smiles: 'C'.repeat(30 + (seq += 1)), phase: 'g', name: `role chain ${seq}`,
        source: { kind: 'entered', values: { dfH: -400, S: 900 }, provenance: { kind: 'citation', citation: 'Invented for the role matrix, not a value' } },
      },
    }),
  },
  { route: 'species/imports', method: 'GET', expect: signedIn(200) },
  { route: 'species/imports', method: 'POST', expect: editorsOwnTeam(201), prepare: async () => ({ rawBody: `${CSV_HEADER}\n${csvRow()}\n`, headers: { 'content-type': 'text/csv' } }) },
  { route: 'species/imports/[importId]', method: 'GET', expect: readersOfResource(200), prepare: async (w) => ({ params: { importId: String((await uploadCsv(w.teamId, w.leadId, `${CSV_HEADER}\n${csvRow()}\n`)).id) } }) },
  { route: 'species/imports/[importId]/commit', method: 'POST', expect: editorsOfResource(200), prepare: async (w) => ({ params: { importId: String((await uploadCsv(w.teamId, w.leadId, `${CSV_HEADER}\n${csvRow()}\n`)).id) }, body: {} }) },
  { route: 'species/imports/[importId]/file', method: 'GET', expect: readersOfResource(200), prepare: async (w) => ({ params: { importId: String((await uploadCsv(w.teamId, w.leadId, `${CSV_HEADER}\n${csvRow()}\n`)).id) } }) },
  // Data fits: a foreign caller's active team is their own, so the main team's data sets and fits are 404 there.
  { route: 'fits/data-sets', method: 'GET', expect: signedIn(200) },
  { route: 'fits/data-sets', method: 'POST', expect: editorsOwnTeam(201), prepare: async () => ({ body: { name: 'Typed set', source: 'grid', rows: [{ T: '300', value: '2' }, { T: '400', value: '5' }, { T: '500', value: '9' }] } }) },
  { route: 'fits/data-sets/[dataSetId]', method: 'GET', expect: readersOfResource(200), prepare: async (w) => ({ params: { dataSetId: String((await makeDataSet(w.teamId, w.leadId)).id) } }) },
  {
    route: 'fits/data-sets/[dataSetId]', method: 'PUT', expect: editorsOfResource(200),
    prepare: async (w) => ({ params: { dataSetId: String((await makeDataSet(w.teamId, w.leadId)).id) }, body: { name: 'Renamed', rows: [{ T: '300', value: '2' }, { T: '400', value: '5' }, { T: '500', value: '9' }] } }),
  },
  { route: 'fits/data-sets/[dataSetId]', method: 'DELETE', expect: editorsOfResource(200), prepare: async (w) => ({ params: { dataSetId: String((await makeDataSet(w.teamId, w.leadId)).id) } }) },
  { route: 'fits/data-sets/[dataSetId]/analysis', method: 'GET', expect: readersOfResource(200), prepare: async (w) => ({ params: { dataSetId: String((await makeDataSet(w.teamId, w.leadId)).id) } }) },
  {
    route: 'fits/data-sets/[dataSetId]/exclusions', method: 'PUT', expect: editorsOfResource(200),
    prepare: async (w) => ({ params: { dataSetId: String((await makeDataSet(w.teamId, w.leadId)).id) }, body: { exclusions: [{ index: 0, reason: 'Thermostat drifted.' }] } }),
  },
  { route: 'fits', method: 'GET', expect: signedIn(200) },
  { route: 'fits', method: 'POST', expect: editorsOfResource(201), prepare: async (w) => ({ body: { dataSetId: (await makeDataSet(w.teamId, w.leadId)).id, name: 'Saved' } }) },
  { route: 'fits/[fitId]', method: 'GET', expect: readersOfResource(200), prepare: async (w) => ({ params: { fitId: String((await makeFit(w.teamId, w.leadId)).id) } }) },
  {
    route: 'fits/[fitId]/species', method: 'POST', expect: editorsOfResource(201),
    prepare: async (w) => {
      // Each success adds NO2(g) to the main team; clear it so the next caller meets the same state.
      await getDb().models.TeamSpecies.destroy({ where: { teamId: w.teamId } });
      return { params: { fitId: String((await makeFit(w.teamId, w.leadId)).id) }, body: { species: 'NO2(g)', name: 'Nitrogen dioxide (fitted)' } };
    },
  },
  // Security (sessions, password reset). Sign-out-everywhere bumps the caller's epoch; callRoute mints each call's cookie with the current one.
  { route: 'me/sign-out-everywhere', method: 'POST', expect: signedIn(200) },
  {
    route: 'password-reset', method: 'POST', expect: { anonymous: 202, reviewer: 202, designer: 202, lead: 202, foreign: 202 },
    prepare: async () => ({ body: { email: `reset-${unique()}@example.test` } }),
  },
  {
    route: 'password-reset/[token]', method: 'POST', expect: { anonymous: 200, reviewer: 200, designer: 200, lead: 200, foreign: 200 },
    prepare: async (w) => {
      const { newResetToken } = await import('@/lib/services/password-reset/reset-token');
      const { token, tokenHash } = newResetToken();
      const userId = await addMember(w.foreignTeamId, 'reviewer');
      await getDb().models.PasswordResetToken.create({ userId, tokenHash, expiresAt: new Date(Date.now() + 600_000) });
      return { params: { token }, body: { password: 'a-fresh-password-1' } };
    },
  },
  // Team export/import (lead only). Import needs an empty team: each call gets a new one whose lead is the caller's role stand-in.
  { route: 'teams/[teamId]/export', method: 'GET', expect: leadOnly(200), prepare: async (w) => ({ params: { teamId: String(w.teamId) } }) },
  {
    route: 'teams/[teamId]/import', method: 'POST', expect: leadOnly(201),
    prepare: async (w, caller) => {
      const { makeTeamWithLead } = await import('./support/fixtures');
      const fresh = await makeTeamWithLead('import-target');
      // The caller joins the empty team in the same role it has in the main team; the foreign caller stays outside it.
      const roles = { reviewer: 'reviewer', designer: 'designer', lead: 'lead' } as const;
      const userId = { reviewer: w.reviewerId, designer: w.designerId, lead: w.leadId }[caller as 'reviewer'];
      if (caller in roles) await getDb().models.Membership.create({ teamId: fresh.teamId, userId, role: roles[caller as keyof typeof roles] });
      const file = { format: 'stepwell.team/1', exportedAt: new Date().toISOString(), team: { id: 1, name: 'Empty' }, people: [], tables: {} };
      return { params: { teamId: String(fresh.teamId) }, body: file };
    },
  },
];

let dir = '';
let world: World;

beforeAll(async () => {
  process.env.SMTP_URL = 'smtp://127.0.0.1:1'; // nothing listens: invitation mail fails fast and is reported, not thrown
  ({ dir } = await setupTestDb());
  world = await makeRoleSet();
});
afterAll(async () => teardownTestDb(dir));

describe('role matrix', () => {
  it('has a row for every exported handler and no stale rows', async () => {
    const exported: string[] = [];
    for (const route of listRouteFiles()) {
      const mod = await importRoute(route);
      for (const method of servedMethods(mod)) exported.push(`${method} ${route}`);
    }
    const listed = TABLE.map((r) => `${r.method} ${r.route}`);
    expect(exported.filter((e) => !listed.includes(e)), 'handlers without a row').toEqual([]);
    expect(listed.filter((l) => !exported.includes(l)), 'rows without a handler').toEqual([]);
  });

  for (const row of TABLE) {
    if (row.expect === 'next-auth') continue; // next-auth's endpoints need a running server: covered by the e2e sign-in tests
    const expected = row.expect;
    it.each(CALLERS)(`${row.method} /api/${row.route} as %s`, async (caller) => {
      const mod = await importRoute<Record<string, Parameters<typeof callRoute>[0]>>(row.route);
      const opts = (await row.prepare?.(world, caller)) ?? {};
      const userId = { anonymous: null, reviewer: world.reviewerId, designer: world.designerId, lead: world.leadId, foreign: world.foreignId }[caller];
      const res = await callRoute(mod[row.method]!, { ...opts, method: row.method, userId });
      expect(res.status, JSON.stringify(res.body)).toBe(expected[caller]);
      if (res.status >= 400) expect(res.body).toMatchObject({ error: { code: expect.any(String), message: expect.any(String) } });
    });
  }
});
