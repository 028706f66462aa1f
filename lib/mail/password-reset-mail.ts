import 'server-only';
import { env } from '../env';
import { escapeHtml } from './escape-html';
import { sendMail } from './transport';

export function passwordResetUrl(token: string): string {
  return new URL(`/reset-password/${encodeURIComponent(token)}`, env().APP_URL).toString();
}

export async function sendPasswordResetMail({ to, token, name }: { to: string; token: string; name: string }) {
  const link = passwordResetUrl(token);
  const text = [
    `Hello ${name},`,
    '',
    `Someone asked to reset the password of your Stepwell account. Choose a new password here: ${link}`,
    '',
    'The link works once and expires in 1 hour. Setting a new password signs you out on every device.',
    'If you did not ask for this, ignore this message; your password stays as it is.',
  ].join('\n');
  const html = `<p>Hello ${escapeHtml(name)},</p>
<p>Someone asked to reset the password of your Stepwell account.</p>
<p><a href="${escapeHtml(link)}">Choose a new password</a></p>
<p>The link works once and expires in 1 hour. Setting a new password signs you out on every device.</p>
<p>If you did not ask for this, ignore this message; your password stays as it is.</p>`;
  await sendMail({ to, subject: 'Reset your Stepwell password', text, html });
}
