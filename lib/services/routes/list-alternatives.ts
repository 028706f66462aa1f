import 'server-only';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';

export interface RouteRefDto {
  id: number;
  name: string;
  status: string;
  /** archived routes are listed but cannot be compared */
  archived: boolean;
}

export interface AlternativeDto extends RouteRefDto {
  updatedAt: string;
}

export interface RouteAlternativesDto {
  /** the route this one was duplicated from; null when it has none, or it is deleted */
  origin: RouteRefDto | null;
  /** routes duplicated from this one, most recently edited first */
  alternatives: AlternativeDto[];
}

const ref = (r: { id: number; name: string; status: string; archivedAt: Date | null }): RouteRefDto => ({ id: r.id, name: r.name, status: r.status, archived: r.archivedAt !== null });

/** The route's origin and its direct alternatives within the team; deleted routes are left out. */
export async function listAlternatives({ teamId, routeId }: { teamId: number; routeId: number }): Promise<RouteAlternativesDto> {
  const { Route } = getDb().models;
  const attributes = ['id', 'name', 'status', 'archivedAt', 'updatedAt', 'originRouteId'] as const;
  const route = Number.isInteger(routeId) && routeId > 0 ? await Route.findOne({ where: { id: routeId, teamId, deletedAt: null }, attributes: [...attributes] }) : null;
  if (!route) throw new AppError('NOT_FOUND', 'No such route.');
  const origin = route.originRouteId
    ? await Route.findOne({ where: { id: route.originRouteId, teamId, deletedAt: null }, attributes: [...attributes] })
    : null;
  const children = await Route.findAll({
    where: { originRouteId: route.id, teamId, deletedAt: null },
    attributes: [...attributes],
    order: [['updated_at', 'DESC'], ['id', 'DESC']],
  });
  return {
    origin: origin ? ref(origin) : null,
    alternatives: children.map((c) => ({ ...ref(c), updatedAt: c.updatedAt.toISOString() })),
  };
}
