import 'server-only';
import type { Transaction } from 'sequelize';
import { getDb } from '../../../db';
import { sendNotificationMail, type NotificationMail } from '../../mail/notification-mail';
import type { NotificationKind } from '../../schemas/notification';
import { absoluteLink, routeStepPath } from './links';
import { isMuted, teamRecipients } from './recipients';

export interface NotificationEntry {
  userId: number;
  kind: NotificationKind;
  title: string;
  /** The comment or note the notification is about; may be empty. */
  text: string;
  caution?: string;
}

export interface RecordedNotifications {
  /** Users who got an in-app notification. */
  notified: number[];
  /** Mails to send once the transaction has committed (muted kinds are left out). */
  mails: NotificationMail[];
}

const TEXT_MAX = 2000;
const TITLE_MAX = 300;

function clip(text: string, max: number): string {
  return text.length > max ? `${text.slice(0, max - 1)}…` : text;
}

/**
 * Writes one in-app notification per entry inside the caller's transaction. Entries for the actor,
 * for non-members of the team, and a second entry for the same user (the first wins) are dropped.
 */
export async function recordNotifications({
  teamId,
  route,
  stepKey,
  stepLabel,
  actorId,
  entries,
  transaction,
}: {
  teamId: number;
  route: { id: number; name: string };
  stepKey: string | null;
  /** how people name the step ("Step 3 (ethanol dehydrogenation)"); the key only goes into the link */
  stepLabel: string | null;
  actorId: number;
  entries: NotificationEntry[];
  transaction: Transaction;
}): Promise<RecordedNotifications> {
  const seen = new Set<number>([actorId]);
  const wanted = entries.filter((e) => (seen.has(e.userId) ? false : (seen.add(e.userId), true)));
  const recipients = await teamRecipients({ teamId, userIds: wanted.map((e) => e.userId), transaction });
  const kept = wanted.filter((e) => recipients.has(e.userId));
  if (kept.length === 0) return { notified: [], mails: [] };
  const link = routeStepPath(route.id, stepKey);
  await getDb().models.Notification.bulkCreate(
    kept.map((e) => ({ userId: e.userId, teamId, kind: e.kind, routeId: route.id, stepKey, actorId, title: clip(e.title, TITLE_MAX), text: clip(e.text, TEXT_MAX), link })),
    { transaction },
  );
  const mails = kept
    .filter((e) => !isMuted(recipients.get(e.userId)!, e.kind))
    .map((e) => ({
      to: recipients.get(e.userId)!.email,
      kind: e.kind,
      title: clip(e.title, TITLE_MAX),
      quote: clip(e.text, TEXT_MAX),
      routeName: route.name,
      stepLabel,
      link: absoluteLink(link),
      settingsLink: absoluteLink('/settings'),
      caution: e.caution,
    }));
  return { notified: kept.map((e) => e.userId), mails };
}

/** Sends after commit. A failed mail is logged and skipped: the in-app notification already stands. */
export async function deliverNotificationMails(mails: NotificationMail[]): Promise<string[]> {
  const sent: string[] = [];
  for (const mail of mails) {
    try {
      await sendNotificationMail(mail);
      sent.push(mail.to);
    } catch (error) {
      console.error(`[stepwell] ${mail.kind} notification mail failed:`, error);
    }
  }
  return sent;
}
