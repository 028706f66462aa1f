import { expect, test } from '@playwright/test';
import { DEMO_PASSWORD, DEMO_USERS } from '../../db/seeders/demo-team';
import { signIn } from './support/auth';

for (const demo of DEMO_USERS) {
  test(`the demo ${demo.role} signs in and sees their role`, async ({ page }) => {
    await signIn(page, demo.email, DEMO_PASSWORD);
    await expect(page.getByRole('navigation', { name: 'Main' })).toBeVisible();
    await expect(page.getByText(demo.role === 'lead' ? 'Group lead' : demo.role === 'designer' ? 'Route designer' : 'Reviewer').first()).toBeVisible();
  });
}

test('a wrong password shows a clear error and signs nobody in', async ({ page }) => {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(DEMO_USERS[0]!.email);
  await page.getByLabel('Password').fill('not-the-password');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByRole('alert').filter({ hasText: 'do not match' })).toBeVisible();
  await page.goto('/routes');
  await expect(page).toHaveURL(/\/sign-in/);
});

test('ten failed sign-ins in a minute for one e-mail get 429 with a wait time', async ({ request }) => {
  const email = 'nobody-here@example.test';
  const attempt = async () => {
    const { csrfToken } = (await (await request.get('/api/auth/csrf')).json()) as { csrfToken: string };
    return request.post('/api/auth/callback/credentials', { form: { email, password: 'wrong-password', csrfToken, json: 'true' } });
  };
  for (let i = 0; i < 10; i += 1) expect((await attempt()).status()).not.toBe(429);
  const blocked = await attempt();
  expect(blocked.status()).toBe(429);
  expect(Number(blocked.headers()['retry-after'])).toBeGreaterThan(0);
  expect(((await blocked.json()) as { error: { code: string } }).error.code).toBe('RATE_LIMITED');
});

// The captured-mail page is off in production builds (tests/unit/dev-mailbox.test.ts); the e2e server opts in.
test('signed-out visitors are sent to sign-in', async ({ page }) => {
  await page.goto('/team');
  await expect(page).toHaveURL(/\/sign-in/);
});
