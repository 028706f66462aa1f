import 'server-only';
import type { Transaction } from 'sequelize';
import { getDb } from '../../../db';
import type { Comment } from '../../../db/models/comment';
import type { Route } from '../../../db/models/route';
import { readStepLabel } from '../routes/read-step-labels';
import { recordNotifications, type NotificationEntry, type RecordedNotifications } from './record-notifications';

/**
 * In-app notifications for a new (or newly edited) comment: a mention for each mentioned member, and
 * comment_on_owned_route for the route's owner unless they were mentioned (one notification, not two).
 */
export async function notifyNewComment({
  comment,
  route,
  actorId,
  mentionIds,
  includeOwner,
  transaction,
}: {
  comment: Comment;
  route: Route;
  actorId: number;
  mentionIds: number[];
  includeOwner: boolean;
  transaction: Transaction;
}): Promise<RecordedNotifications> {
  const actor = await getDb().models.User.findByPk(actorId, { attributes: ['name'], transaction });
  const actorName = actor?.name ?? 'Someone';
  // People know a step as "Step 3 (ethanol dehydrogenation)", never by its key.
  const stepLabel = comment.stepKey ? ((await readStepLabel({ routeId: route.id, stepKey: comment.stepKey, transaction })) ?? 'a removed step') : null;
  const where = stepLabel ? `${route.name} · ${stepLabel}` : route.name;
  const entries: NotificationEntry[] = mentionIds.map((userId) => ({ userId, kind: 'mention', title: `${actorName} mentioned you on ${where}`, text: comment.body }));
  if (includeOwner) entries.push({ userId: route.createdById, kind: 'comment_on_owned_route', title: `${actorName} commented on ${where}`, text: comment.body });
  return recordNotifications({ teamId: route.teamId, route: { id: route.id, name: route.name }, stepKey: comment.stepKey, stepLabel, actorId, entries, transaction });
}
