import 'server-only';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';
import { recordEvent } from '../audit/record-event';
import { forUpdate } from '../row-lock';
import { UNDELETE_WINDOW_DAYS } from '../../schemas/route';
import { findRouteRow } from './get-route';

export { UNDELETE_WINDOW_DAYS };
const WINDOW_MS = UNDELETE_WINDOW_DAYS * 86_400_000;

export function restorableUntil(deletedAt: Date): Date {
  return new Date(deletedAt.getTime() + WINDOW_MS);
}

// Soft delete: the rows stay, every route-scoped reader answers 404 until a lead brings the route back.
export async function deleteRoute({ teamId, userId, routeId }: { teamId: number; userId: number; routeId: number }) {
  const { sequelize } = getDb();
  return sequelize.transaction(async (transaction) => {
    const route = await findRouteRow({ teamId, routeId, transaction, locked: true });
    const deletedAt = new Date();
    await route.update({ deletedAt, deletedById: userId }, { transaction });
    await recordEvent({ teamId, actorId: userId, action: 'route.deleted', targetType: 'route', targetId: routeId }, transaction);
    return { id: route.id, deleted: true, deletedAt: deletedAt.toISOString(), restorableUntil: restorableUntil(deletedAt).toISOString() };
  });
}

export async function undeleteRoute({ teamId, userId, routeId, now = new Date() }: { teamId: number; userId: number; routeId: number; now?: Date }) {
  const { sequelize, models } = getDb();
  return sequelize.transaction(async (transaction) => {
    const route = await models.Route.findOne({ where: { id: routeId, teamId }, ...forUpdate(transaction) });
    if (!route) throw new AppError('NOT_FOUND', 'No such route.');
    if (!route.deletedAt) throw new AppError('CONFLICT', 'This route is not deleted.');
    if (now.getTime() > restorableUntil(route.deletedAt).getTime()) {
      throw new AppError('GONE', `This route was deleted more than ${UNDELETE_WINDOW_DAYS} days ago (on ${route.deletedAt.toISOString().slice(0, 10)}) and can no longer be brought back.`);
    }
    await route.update({ deletedAt: null, deletedById: null }, { transaction });
    await recordEvent({ teamId, actorId: userId, action: 'route.undeleted', targetType: 'route', targetId: routeId }, transaction);
    return { id: route.id, deleted: false, version: route.version };
  });
}
