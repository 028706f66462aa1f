import 'server-only';
import { Op, type Transaction } from 'sequelize';
import { getDb } from '../../../db';
import type { Route } from '../../../db/models/route';
import type { RouteStatus } from '../../schemas/workflow';
import { APPROVAL_CAUTION } from '../notifications/notify-workflow';
import type { PersonRef, TransitionOutcome } from './transition-dto';

async function names(ids: number[], transaction: Transaction): Promise<Map<number, string>> {
  if (ids.length === 0) return new Map();
  const users = await getDb().models.User.findAll({ where: { id: { [Op.in]: ids } }, attributes: ['id', 'name'], transaction });
  return new Map(users.map((u) => [u.id, u.name]));
}

// Writes the move (and any named reviewers) for a route row already updated to `to`, inside the caller's transaction.
export async function recordTransition({
  route,
  from,
  to,
  actorId,
  note,
  reviewerIds = [],
  transaction,
}: {
  route: Route;
  from: RouteStatus;
  to: RouteStatus;
  actorId: number;
  note: string;
  reviewerIds?: number[];
  transaction: Transaction;
}): Promise<TransitionOutcome> {
  const { RouteTransition, RouteReviewer } = getDb().models;
  const row = await RouteTransition.create(
    { routeId: route.id, teamId: route.teamId, fromStatus: from, toStatus: to, actorId, note, routeVersion: route.version },
    { transaction },
  );
  if (reviewerIds.length > 0) {
    await RouteReviewer.bulkCreate(reviewerIds.map((userId) => ({ routeId: route.id, transitionId: row.id, userId })), { transaction });
  }
  const submission =
    to === 'in_review'
      ? { actorId, reviewerIds }
      : await latestSubmission(route.id, transaction);
  const people = await names([actorId, ...reviewerIds], transaction);
  const reviewers: PersonRef[] = reviewerIds.map((id) => ({ id, name: people.get(id) ?? '—' }));
  return {
    route: { id: route.id, teamId: route.teamId, name: route.name, status: to, version: route.version },
    transition: {
      id: row.id,
      routeId: route.id,
      from,
      to,
      actor: { id: actorId, name: people.get(actorId) ?? '—' },
      note,
      reviewers,
      routeVersion: route.version,
      createdAt: row.createdAt.toISOString(),
    },
    reviewerIds: submission?.reviewerIds ?? [],
    submitterId: submission?.actorId ?? null,
    ...(to === 'approved' ? { caution: APPROVAL_CAUTION } : {}),
  };
}

async function latestSubmission(routeId: number, transaction: Transaction): Promise<{ actorId: number | null; reviewerIds: number[] } | null> {
  const { RouteTransition, RouteReviewer } = getDb().models;
  const last = await RouteTransition.findOne({ where: { routeId, toStatus: 'in_review' }, order: [['id', 'DESC']], attributes: ['id', 'actorId'], transaction });
  if (!last) return null;
  const reviewers = await RouteReviewer.findAll({ where: { transitionId: last.id }, attributes: ['userId'], order: [['id', 'ASC']], transaction });
  return { actorId: last.actorId, reviewerIds: reviewers.map((r) => r.userId) };
}
