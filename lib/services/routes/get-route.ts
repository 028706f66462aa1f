import 'server-only';
import type { Transaction } from 'sequelize';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';
import { forUpdate } from '../row-lock';
import { readLinkInputs, readStepInputs } from './read-route-rows';
import { toRouteDocument, type RouteDocumentDto } from './route-dto';

// A deleted route is gone for every reader and writer until a lead brings it back.
// `locked` holds the row until the transaction ends, for writes that depend on what was read.
export async function findRouteRow({ teamId, routeId, transaction, locked = false }: { teamId: number; routeId: number; transaction?: Transaction; locked?: boolean }) {
  const options = transaction && locked ? forUpdate(transaction) : { transaction };
  const route = await getDb().models.Route.findOne({ where: { id: routeId, teamId, deletedAt: null }, ...options });
  if (!route) throw new AppError('NOT_FOUND', 'No such route.');
  return route;
}

export async function getRoute({ teamId, routeId, transaction }: { teamId: number; routeId: number; transaction?: Transaction }): Promise<RouteDocumentDto> {
  const route = await findRouteRow({ teamId, routeId, transaction });
  const [steps, links] = await Promise.all([readStepInputs(routeId, transaction), readLinkInputs(routeId, transaction)]);
  return toRouteDocument(route, steps, links);
}
