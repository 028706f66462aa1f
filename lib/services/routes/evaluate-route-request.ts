import 'server-only';
import type { RouteDraft } from '../../schemas/route';
import { evaluateRoute } from '../../thermo/route';
import { listDrivers } from '../drivers/list-drivers';
import { toRouteEvaluateRequest } from './evaluate-route-document';
import { getRoute } from './get-route';

// Engine errors about the route as a whole (empty, cycle, missing step) propagate and become 400s.
export async function evaluateRouteRequest({ teamId, routeId, draft }: { teamId: number; routeId: number; draft?: RouteDraft }) {
  const [saved, drivers] = await Promise.all([getRoute({ teamId, routeId }), listDrivers({ teamId })]);
  const source = draft ?? saved;
  const request = toRouteEvaluateRequest(source) as Parameters<typeof evaluateRoute>[0];
  return { version: saved.version, draft: Boolean(draft), evaluation: evaluateRoute(request, { drivers }) };
}
