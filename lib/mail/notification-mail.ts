import 'server-only';
import type { NotificationKind } from '../schemas/notification';
import { escapeHtml } from './escape-html';
import { sendMail } from './transport';

export interface NotificationMail {
  to: string;
  kind: NotificationKind;
  title: string;
  /** The comment or note, as written (shown as quoted plain text, never as HTML). */
  quote: string;
  routeName: string;
  /** the step as people name it ("Step 3 (ethanol dehydrogenation)"), never its key */
  stepLabel: string | null;
  /** Absolute link straight to the step (or the route). */
  link: string;
  settingsLink: string;
  /** An extra line for the reader, such as the safety caution on an approval. */
  caution?: string;
}

const WHY: Record<NotificationKind, string> = {
  review_request: 'You were named as a reviewer.',
  mention: 'You were mentioned in a comment.',
  status_change: 'You own or review this route.',
  comment_on_owned_route: 'You own this route.',
};

export function renderNotificationMail(mail: NotificationMail): { subject: string; text: string; html: string } {
  const where = mail.stepLabel ? `${mail.routeName}, ${mail.stepLabel}` : mail.routeName;
  const openLabel = mail.stepLabel ? `Open ${mail.stepLabel} of ${mail.routeName}` : `Open ${mail.routeName}`;
  const quoted = mail.quote.trim();
  const text = [
    mail.title,
    `Route: ${where}`,
    ...(quoted ? ['', ...quoted.split('\n').map((line) => `> ${line}`)] : []),
    ...(mail.caution ? ['', mail.caution] : []),
    '',
    `${openLabel}: ${mail.link}`,
    '',
    `${WHY[mail.kind]} Turn this kind of e-mail off in Settings: ${mail.settingsLink}`,
  ].join('\n');
  const html = [
    `<p>${escapeHtml(mail.title)}</p>`,
    `<p>Route: <strong>${escapeHtml(where)}</strong></p>`,
    quoted ? `<blockquote style="white-space: pre-wrap">${escapeHtml(quoted)}</blockquote>` : '',
    mail.caution ? `<p>${escapeHtml(mail.caution)}</p>` : '',
    `<p><a href="${escapeHtml(mail.link)}">${escapeHtml(openLabel)}</a></p>`,
    `<p>${escapeHtml(WHY[mail.kind])} <a href="${escapeHtml(mail.settingsLink)}">Turn this kind of e-mail off in Settings</a>.</p>`,
  ]
    .filter(Boolean)
    .join('\n');
  return { subject: `[Stepwell] ${mail.title}`, text, html };
}

export async function sendNotificationMail(mail: NotificationMail): Promise<void> {
  await sendMail({ to: mail.to, ...renderNotificationMail(mail) });
}
