import 'server-only';
import { getDb } from '../../../db';

async function teamOf(params: Record<string, string>, includeDeleted: boolean): Promise<number | null> {
  const id = Number(params.routeId);
  if (!Number.isInteger(id) || id <= 0) return null;
  const route = await getDb().models.Route.findByPk(id, { attributes: ['teamId', 'deletedAt'] });
  if (!route || (route.deletedAt !== null && !includeDeleted)) return null;
  return route.teamId;
}

// The team owning /api/routes/[routeId]; withRoute checks the caller's membership in it. A deleted route has none (404).
export function teamOfRoute(params: Record<string, string>): Promise<number | null> {
  return teamOf(params, false);
}

// Only for bringing a deleted route back.
export function teamOfRouteIncludingDeleted(params: Record<string, string>): Promise<number | null> {
  return teamOf(params, true);
}
