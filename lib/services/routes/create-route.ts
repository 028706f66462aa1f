import 'server-only';
import { getDb } from '../../../db';
import type { CreateRouteInput } from '../../schemas/route';
import { recordEvent } from '../audit/record-event';
import { getRoute } from './get-route';

export async function createRoute({ teamId, userId, input }: { teamId: number; userId: number; input: CreateRouteInput }) {
  const { sequelize, models } = getDb();
  return sequelize.transaction(async (transaction) => {
    const route = await models.Route.create({ teamId, ...input, createdById: userId, updatedById: userId }, { transaction });
    await recordEvent({ teamId, actorId: userId, action: 'route.created', targetType: 'route', targetId: route.id }, transaction);
    return getRoute({ teamId, routeId: route.id, transaction });
  });
}
