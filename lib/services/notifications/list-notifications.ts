import 'server-only';
import { Op, type WhereOptions } from 'sequelize';
import { getDb } from '../../../db';
import type { Notification } from '../../../db/models/notification';
import { AFTER_STEP_WORD, relabelStepIds, type StepLabel } from '../../route-editor/step-label';
import type { ListNotificationsQuery, NotificationDto, NotificationPageDto } from '../../schemas/notification';
import { readStepLabels } from '../routes/read-step-labels';

// Only the caller's own, and only from teams they still belong to.
export async function ownNotificationsWhere(userId: number): Promise<WhereOptions<Notification>> {
  const teams = await getDb().models.Membership.findAll({ where: { userId }, attributes: ['teamId'] });
  return { userId, teamId: { [Op.in]: teams.map((t) => t.teamId) } };
}

export async function unreadCount(userId: number): Promise<number> {
  return getDb().models.Notification.count({ where: { ...(await ownNotificationsWhere(userId)), readAt: null } });
}

export async function listNotifications({ userId, query }: { userId: number; query: ListNotificationsQuery }): Promise<NotificationPageDto> {
  const { Notification, User } = getDb().models;
  const own = await ownNotificationsWhere(userId);
  const where: WhereOptions<Notification> = {
    ...own,
    ...(query.before ? { id: { [Op.lt]: query.before } } : {}),
    ...(query.unread === '1' ? { readAt: null } : {}),
  };
  const [rows, unread] = await Promise.all([
    Notification.findAll({ where, include: [{ model: User, as: 'actor', attributes: ['id', 'name'] }], order: [['id', 'DESC']], limit: query.limit + 1 }),
    Notification.count({ where: { ...own, readAt: null } }),
  ]);
  const page = rows.slice(0, query.limit);
  // Titles written before step labels say "step s-8ab5e2fd": they read with today's label of that step.
  const old = page.filter((r) => r.routeId !== null && r.stepKey && r.title.includes(`step ${r.stepKey}`));
  const labels = await readStepLabels(old.map((r) => r.routeId!));
  return {
    items: page.map((row) => toNotificationDto(row, row.routeId === null ? undefined : labels.get(row.routeId))),
    unreadCount: unread,
    nextBefore: rows.length > query.limit ? page[page.length - 1]!.id : null,
  };
}

function readableTitle(row: Notification, labels: ReadonlyMap<string, StepLabel> | undefined): string {
  if (!row.stepKey || !labels) return row.title;
  const label = labels.get(row.stepKey) ?? { number: 0, short: 'a removed step', full: 'a removed step' };
  return relabelStepIds(row.title, new Map([[row.stepKey, label]]), AFTER_STEP_WORD);
}

function toNotificationDto(row: Notification, labels?: ReadonlyMap<string, StepLabel>): NotificationDto {
  const actor = row.get('actor') as { id: number; name: string } | null | undefined;
  return {
    id: row.id,
    teamId: row.teamId,
    kind: row.kind,
    routeId: row.routeId,
    stepKey: row.stepKey,
    actor: actor ? { id: actor.id, name: actor.name } : null,
    title: readableTitle(row, labels),
    text: row.text,
    link: row.link,
    isRead: row.readAt !== null,
    createdAt: row.createdAt.toISOString(),
  };
}
