import 'server-only';
import { Op, type WhereOptions } from 'sequelize';
import { getDb } from '../../../db';
import type { Notification } from '../../../db/models/notification';
import type { ListNotificationsQuery, NotificationDto, NotificationPageDto } from '../../schemas/notification';

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
  return {
    items: page.map(toNotificationDto),
    unreadCount: unread,
    nextBefore: rows.length > query.limit ? page[page.length - 1]!.id : null,
  };
}

function toNotificationDto(row: Notification): NotificationDto {
  const actor = row.get('actor') as { id: number; name: string } | null | undefined;
  return {
    id: row.id,
    teamId: row.teamId,
    kind: row.kind,
    routeId: row.routeId,
    stepKey: row.stepKey,
    actor: actor ? { id: actor.id, name: actor.name } : null,
    title: row.title,
    text: row.text,
    link: row.link,
    isRead: row.readAt !== null,
    createdAt: row.createdAt.toISOString(),
  };
}
