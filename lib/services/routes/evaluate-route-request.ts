import 'server-only';
import type { RouteDraft } from '../../schemas/route';
import { evaluateRoute } from '../../thermo/route';
import { listDrivers } from '../drivers/list-drivers';
import { fitOverrides } from '../fits/fit-overrides';
import { teamLookup } from '../species/team-lookup';
import { toRouteEvaluateRequest } from './evaluate-route-document';
import { findRouteRow, getRoute } from './get-route';

// Engine errors about the route as a whole (empty, cycle, missing step) propagate and become 400s.
export async function evaluateRouteRequest({ teamId, routeId, draft }: { teamId: number; routeId: number; draft?: RouteDraft }) {
  const [drivers, lookup] = await Promise.all([listDrivers({ teamId }), teamLookup(teamId)]);
  // A draft brings its own steps: read only the route row for its version, not every saved step.
  const saved = draft ? null : await getRoute({ teamId, routeId });
  const version = saved ? saved.version : (await findRouteRow({ teamId, routeId })).version;
  const source = draft ?? saved!;
  const fits = await fitOverrides({ teamId, steps: source.steps });
  const request = toRouteEvaluateRequest(source, fits) as Parameters<typeof evaluateRoute>[0];
  return { version, draft: Boolean(draft), evaluation: evaluateRoute(request, { drivers, lookup }) };
}
