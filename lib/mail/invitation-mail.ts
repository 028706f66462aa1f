import 'server-only';
import { ROLE_LABELS, type Role } from '../auth/roles';
import { env } from '../env';
import { escapeHtml } from './escape-html';
import { sendMail } from './transport';

export function invitationUrl(token: string): string {
  return new URL(`/invite/${encodeURIComponent(token)}`, env().APP_URL).toString();
}

export async function sendInvitationMail({ to, token, teamName, inviterName, role }: { to: string; token: string; teamName: string; inviterName: string; role: Role }) {
  const link = invitationUrl(token);
  const roleLabel = ROLE_LABELS[role];
  const text = [
    `${inviterName} invited you to join ${teamName} on Stepwell as ${roleLabel}.`,
    '',
    `Accept the invitation: ${link}`,
    '',
    'The link works once and expires in 7 days. If you did not expect this, ignore this message.',
  ].join('\n');
  const html = `<p>${escapeHtml(inviterName)} invited you to join <strong>${escapeHtml(teamName)}</strong> on Stepwell as ${escapeHtml(roleLabel)}.</p>
<p><a href="${escapeHtml(link)}">Accept the invitation</a></p>
<p>The link works once and expires in 7 days. If you did not expect this, ignore this message.</p>`;
  await sendMail({ to, subject: `Join ${teamName} on Stepwell`, text, html });
}
