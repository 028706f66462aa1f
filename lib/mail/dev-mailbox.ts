import type { Env } from '../env';

/** /dev/mail shows captured mail in development, and in a production build only when SHOW_DEV_MAILBOX=1 (the e2e server). */
export function devMailboxAllowed(e: Pick<Env, 'NODE_ENV' | 'SHOW_DEV_MAILBOX'>): boolean {
  return e.NODE_ENV !== 'production' || e.SHOW_DEV_MAILBOX === '1';
}
