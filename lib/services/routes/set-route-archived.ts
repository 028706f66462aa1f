import 'server-only';
import { getDb } from '../../../db';
import { recordEvent } from '../audit/record-event';
import { findRouteRow } from './get-route';

export async function setRouteArchived({ teamId, userId, routeId, archived }: { teamId: number; userId: number; routeId: number; archived: boolean }) {
  const { sequelize } = getDb();
  return sequelize.transaction(async (transaction) => {
    const route = await findRouteRow({ teamId, routeId, transaction, locked: true });
    await route.update({ archivedAt: archived ? new Date() : null, updatedById: userId, version: route.version + 1 }, { transaction });
    await recordEvent({ teamId, actorId: userId, action: archived ? 'route.archived' : 'route.unarchived', targetType: 'route', targetId: routeId }, transaction);
    return { id: route.id, archived, version: route.version };
  });
}
