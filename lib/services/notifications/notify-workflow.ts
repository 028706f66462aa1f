import 'server-only';
import { getDb } from '../../../db';
import type { Route } from '../../../db/models/route';
import { findRouteRow } from '../routes/get-route';
import { deliverNotificationMails, recordNotifications, type NotificationEntry } from './record-notifications';

export interface NotifyResult {
  /** Users who got an in-app notification. */
  notified: number[];
  /** Addresses the mail server accepted a mail for. */
  mailed: string[];
}

const STATUS_LABELS: Record<string, string> = {
  draft: 'draft',
  in_review: 'in review',
  changes_requested: 'changes requested',
  approved: 'approved',
  shelved: 'shelved',
};

export function statusLabel(status: string): string {
  return STATUS_LABELS[status] ?? status.replace(/_/g, ' ');
}

// An approval is of a thermodynamic screen only; every mail about one says so.
export const APPROVAL_CAUTION =
  'Approval records a thermodynamic screen of the route. It says nothing of rates, heat release and runaway, or toxicity: those need their own review before any work at the bench.';

async function notify({ teamId, routeId, actorId, build }: { teamId: number; routeId: number; actorId: number; build: (actorName: string, route: Route) => NotificationEntry[] }): Promise<NotifyResult> {
  const { sequelize, models } = getDb();
  const { notified, mails } = await sequelize.transaction(async (transaction) => {
    const route = await findRouteRow({ teamId, routeId, transaction });
    const actor = await models.User.findByPk(actorId, { attributes: ['name'], transaction });
    const entries = build(actor?.name ?? 'Someone', route);
    return recordNotifications({ teamId, route: { id: route.id, name: route.name }, stepKey: null, stepLabel: null, actorId, entries, transaction });
  });
  return { notified, mailed: await deliverNotificationMails(mails) };
}

/**
 * Tells each named reviewer (a member of the team, not the actor) that a route awaits their review.
 * Call it after the workflow transaction has committed.
 */
export async function notifyReviewRequest({ teamId, routeId, actorId, reviewerIds, note }: { teamId: number; routeId: number; actorId: number; reviewerIds: number[]; note?: string | null }): Promise<NotifyResult> {
  return notify({
    teamId,
    routeId,
    actorId,
    build: (actorName, route) =>
      reviewerIds.map((userId) => ({ userId, kind: 'review_request', title: `${actorName} asked you to review ${route.name}`, text: note ?? '' })),
  });
}

/**
 * Tells the route's owner and the named reviewers (minus the actor) that the route moved from one
 * status to another. Call it after the workflow transaction has committed.
 */
export async function notifyStatusChange({
  teamId,
  routeId,
  actorId,
  from,
  to,
  note,
  reviewerIds = [],
}: {
  teamId: number;
  routeId: number;
  actorId: number;
  from: string;
  to: string;
  note?: string | null;
  reviewerIds?: number[];
}): Promise<NotifyResult> {
  return notify({
    teamId,
    routeId,
    actorId,
    build: (actorName, route) =>
      [route.createdById, ...reviewerIds].map((userId) => ({
        userId,
        kind: 'status_change',
        title: `${actorName} moved ${route.name} from ${statusLabel(from)} to ${statusLabel(to)}`,
        text: note ?? '',
        caution: to === 'approved' ? APPROVAL_CAUTION : undefined,
      })),
  });
}
