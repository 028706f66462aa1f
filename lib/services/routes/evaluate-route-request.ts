import 'server-only';
import type { RouteDraft } from '../../schemas/route';
import { BoundedMemo } from '../../thermo/bounded-memo';
import type { SpeciesLookup } from '../../thermo';
import { evaluateRoute, type DriverReaction, type RouteEvaluateResponse } from '../../thermo/route';
import { listDrivers } from '../drivers/list-drivers';
import { fitOverrides } from '../fits/fit-overrides';
import { teamLookup } from '../species/team-lookup';
import { toRouteEvaluateRequest } from './evaluate-route-document';
import { findRouteRow, getRoute } from './get-route';

// A saved route's evaluation depends only on its version, the team's drivers and its species lookup (a new
// lookup object whenever the team's species change; saved fits never change), so it is kept per lookup.
const savedEvaluations = new WeakMap<SpeciesLookup, BoundedMemo<string, RouteEvaluateResponse>>();

function memoFor(lookup: SpeciesLookup): BoundedMemo<string, RouteEvaluateResponse> {
  let memo = savedEvaluations.get(lookup);
  if (!memo) {
    memo = new BoundedMemo(64);
    savedEvaluations.set(lookup, memo);
  }
  return memo;
}

const driversKey = (drivers: readonly DriverReaction[]) => drivers.map((d) => `${d.id}=${d.equation}`).join('\n');

async function evaluateDocument(teamId: number, source: RouteDraft, drivers: readonly DriverReaction[], lookup: SpeciesLookup): Promise<RouteEvaluateResponse> {
  const fits = await fitOverrides({ teamId, steps: source.steps });
  const request = toRouteEvaluateRequest(source, fits) as Parameters<typeof evaluateRoute>[0];
  return evaluateRoute(request, { drivers, lookup });
}

// Engine errors about the route as a whole (empty, cycle, missing step) propagate and become 400s.
export async function evaluateRouteRequest({ teamId, routeId, draft }: { teamId: number; routeId: number; draft?: RouteDraft }) {
  const [drivers, lookup, row] = await Promise.all([listDrivers({ teamId }), teamLookup(teamId), findRouteRow({ teamId, routeId })]);
  // A draft brings its own steps: only the route row is read, for its version.
  if (draft) return { version: row.version, draft: true, evaluation: await evaluateDocument(teamId, draft, drivers, lookup) };
  const memo = memoFor(lookup);
  const key = `${routeId}:${row.version}:${driversKey(drivers)}`;
  const hit = memo.get(key);
  if (hit) return { version: row.version, draft: false, evaluation: hit };
  const saved = await getRoute({ teamId, routeId });
  const evaluation = await evaluateDocument(teamId, saved, drivers, lookup);
  // Keyed by the version read with the steps, in case a save landed in between.
  memo.set(`${routeId}:${saved.version}:${driversKey(drivers)}`, evaluation);
  return { version: saved.version, draft: false, evaluation };
}
