import 'server-only';
import { Op, type Transaction } from 'sequelize';
import { getDb } from '../../../db';
import type { NotificationKind, NotificationMutes } from '../../schemas/notification';

export interface Recipient {
  userId: number;
  name: string;
  email: string;
  mutes: NotificationMutes;
}

/** Current members of the team among `userIds`, with their e-mail and mutes; anyone else is dropped. */
export async function teamRecipients({ teamId, userIds, transaction }: { teamId: number; userIds: number[]; transaction?: Transaction }): Promise<Map<number, Recipient>> {
  const { Membership, User, UserPreference } = getDb().models;
  const ids = [...new Set(userIds)];
  if (ids.length === 0) return new Map();
  const [members, prefs] = await Promise.all([
    Membership.findAll({ where: { teamId, userId: { [Op.in]: ids } }, include: [{ model: User, as: 'user' }], transaction }),
    UserPreference.findAll({ where: { userId: { [Op.in]: ids } }, transaction }),
  ]);
  const prefOf = new Map(prefs.map((p) => [p.userId, p]));
  const found = new Map<number, Recipient>();
  for (const m of members) {
    const user = m.get('user') as InstanceType<typeof User>;
    found.set(m.userId, { userId: m.userId, name: user.name, email: user.email, mutes: mutesOf(prefOf.get(m.userId)) });
  }
  return found;
}

export function mutesOf(prefs: { muteReviewRequest: boolean; muteMention: boolean; muteStatusChange: boolean; muteCommentOnOwnedRoute: boolean } | undefined | null): NotificationMutes {
  return {
    review_request: prefs?.muteReviewRequest ?? false,
    mention: prefs?.muteMention ?? false,
    status_change: prefs?.muteStatusChange ?? false,
    comment_on_owned_route: prefs?.muteCommentOnOwnedRoute ?? false,
  };
}

export function isMuted(recipient: Recipient, kind: NotificationKind): boolean {
  return recipient.mutes[kind];
}
