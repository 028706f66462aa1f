import 'server-only';
import { getDb } from '../../../db';

// The team owning /api/routes/[routeId]; withRoute checks the caller's membership in it.
export async function teamOfRoute(params: Record<string, string>): Promise<number | null> {
  const id = Number(params.routeId);
  if (!Number.isInteger(id) || id <= 0) return null;
  const route = await getDb().models.Route.findByPk(id, { attributes: ['teamId'] });
  return route?.teamId ?? null;
}
