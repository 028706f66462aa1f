import 'server-only';
import type { Transaction } from 'sequelize';
import { getDb } from '../../../db';
import { AppError } from '../../api/errors';
import { findRouteRow } from '../routes/get-route';
import { toRevision } from './revision-dto';

// A revision counts only under its own route (and that route's team); any other id is 404.
export async function findRevisionRow({ teamId, routeId, revisionId, transaction }: { teamId: number; routeId: number; revisionId: number; transaction?: Transaction }) {
  const { RouteRevision, User } = getDb().models;
  const row = await RouteRevision.findOne({
    where: { id: revisionId, routeId, teamId },
    include: [{ model: User, as: 'author', attributes: ['name'] }],
    transaction,
  });
  if (!row) throw new AppError('NOT_FOUND', 'No such revision of this route.');
  return row;
}

export async function getRevision({ teamId, routeId, revisionId }: { teamId: number; routeId: number; revisionId: number }) {
  await findRouteRow({ teamId, routeId });
  return toRevision(await findRevisionRow({ teamId, routeId, revisionId }));
}
