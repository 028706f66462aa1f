import { describe, expect, it } from 'vitest';
import { readEnv } from '@/lib/env';
import { devMailboxAllowed } from '@/lib/mail/dev-mailbox';

describe('the captured-mail page', () => {
  it('is off in a production build unless the e2e server opts in', () => {
    expect(devMailboxAllowed(readEnv({ NODE_ENV: 'production' }))).toBe(false);
    expect(devMailboxAllowed(readEnv({ NODE_ENV: 'production', SHOW_DEV_MAILBOX: '1' }))).toBe(true);
    expect(devMailboxAllowed(readEnv({ NODE_ENV: 'development' }))).toBe(true);
  });

  it('takes only 0 or 1 for the switch', () => {
    expect(() => readEnv({ NODE_ENV: 'production', SHOW_DEV_MAILBOX: 'yes' })).toThrow(/SHOW_DEV_MAILBOX/);
  });
});
