import 'server-only';
import { getDb } from '../../../db';
import type { CreateRouteInput } from '../../schemas/route';
import { recordEvent } from '../audit/record-event';
import { recordRevision } from '../revisions/record-revision';
import { getRoute } from './get-route';

// A new route starts at version 1 with its first revision, "Created".
export async function createRoute({ teamId, userId, input }: { teamId: number; userId: number; input: CreateRouteInput }) {
  const { sequelize, models } = getDb();
  return sequelize.transaction(async (transaction) => {
    const route = await models.Route.create({ teamId, ...input, createdById: userId, updatedById: userId }, { transaction });
    await recordEvent({ teamId, actorId: userId, action: 'route.created', targetType: 'route', targetId: route.id }, transaction);
    const doc = await getRoute({ teamId, routeId: route.id, transaction });
    await recordRevision({ doc, teamId, userId, evaluation: null, previous: null, head: 'Created', transaction });
    return doc;
  });
}
