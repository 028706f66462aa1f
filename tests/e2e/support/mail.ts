import { expect } from '@playwright/test';
import { findInvitationLink, readMailbox } from '../../../lib/mail/mailbox';
import { E2E_MAIL_DIR } from './e2e-env';

// Polls the fake SMTP server's folder for the invitation sent to `to`.
export async function invitationLinkFor(to: string): Promise<string> {
  let link: string | null = null;
  await expect
    .poll(() => {
      const mail = readMailbox(E2E_MAIL_DIR).find((m) => m.to.includes(to));
      link = mail ? findInvitationLink(mail) : null;
      return link;
    }, { message: `an invitation mail to ${to}` })
    .not.toBeNull();
  return link!;
}
