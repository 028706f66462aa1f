import fs from 'node:fs';
import path from 'node:path';
import { expect, test, type Page } from '@playwright/test';
import { readMailbox } from '../../lib/mail/mailbox';
import { signIn } from './support/auth';
import { E2E_MAIL_DIR, e2eEnv } from './support/e2e-env';

const ROOT = path.resolve(__dirname, '../..');
const STATIC = path.join(ROOT, '.next/static');

// Every value that could have been the secret at build time: the e2e server's, the shell's, and any .env file's.
function secretCandidates(): Map<string, string> {
  const found = new Map<string, string>();
  const add = (source: string, key: string, value: string | undefined) => {
    if (value && value.length >= 8 && /SECRET|PASSWORD|TOKEN|KEY/i.test(key)) found.set(value, `${key} from ${source}`);
  };
  add('the e2e server', 'NEXTAUTH_SECRET', e2eEnv().NEXTAUTH_SECRET);
  add('the environment', 'NEXTAUTH_SECRET', process.env.NEXTAUTH_SECRET);
  for (const name of fs.readdirSync(ROOT).filter((f) => f.startsWith('.env'))) {
    for (const line of fs.readFileSync(path.join(ROOT, name), 'utf8').split('\n')) {
      const m = line.match(/^\s*([A-Z0-9_]+)\s*=\s*["']?(.*?)["']?\s*$/);
      if (m) add(name, m[1]!, m[2]);
    }
  }
  return found;
}

function filesUnder(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => (e.isDirectory() ? filesUnder(path.join(dir, e.name)) : [path.join(dir, e.name)]));
}

test('the client bundle carries no secret from the build environment', () => {
  test.skip(!fs.existsSync(STATIC), 'No .next/static: run `next build` first (npm test builds before this stage).');
  const secrets = secretCandidates();
  expect(secrets.size, 'at least the e2e NEXTAUTH_SECRET is checked').toBeGreaterThan(0);
  const files = filesUnder(STATIC);
  expect(files.length).toBeGreaterThan(0);
  const leaks: string[] = [];
  for (const file of files) {
    const text = fs.readFileSync(file, 'latin1');
    for (const [value, label] of secrets) if (text.includes(value)) leaks.push(`${label} in ${path.relative(ROOT, file)}`);
  }
  expect(leaks).toEqual([]);
});

test('pages carry a nonce CSP that their own scripts match, API answers a deny-all one', async ({ request }) => {
  const page = await request.get('/sign-in');
  const csp = page.headers()['content-security-policy'] ?? '';
  const nonce = csp.match(/script-src [^;]*'nonce-([^']+)'/)?.[1];
  expect(nonce, csp).toBeTruthy();
  expect(csp).not.toMatch(/script-src [^;]*'unsafe-inline'/);
  expect(csp).toContain("frame-ancestors 'none'");
  expect(page.headers()['x-content-type-options']).toBe('nosniff');
  expect(page.headers()['referrer-policy']).toBe('strict-origin-when-cross-origin');
  const html = await page.text();
  const scripts = [...html.matchAll(/<script\b[^>]*>/g)].map((m) => m[0]);
  expect(scripts.length).toBeGreaterThan(0);
  for (const tag of scripts) expect(tag).toContain(`nonce="${nonce}"`);
  const again = await request.get('/sign-in');
  expect(again.headers()['content-security-policy']).not.toBe(csp);

  const api = await request.get('/api/health');
  expect(api.headers()['content-security-policy']).toContain("default-src 'none'");
  expect(api.headers()['content-security-policy']).toContain("frame-ancestors 'none'");
  expect(api.headers()['x-content-type-options']).toBe('nosniff');
});

async function watchViolations(page: Page): Promise<string[]> {
  const violations: string[] = [];
  page.on('console', (msg) => {
    if (/Content Security Policy|Refused to (execute|load|apply)/i.test(msg.text())) violations.push(msg.text());
  });
  return violations;
}

test('password reset by mail works in the browser under the CSP, and the old password stops working', async ({ page, request }) => {
  const violations = await watchViolations(page);
  const email = `reset-${Date.now()}@kestrel-ridge.example`;
  const signUp = await request.post('/api/signup', {
    data: { name: 'Hanne Vasquez-Lind', email, password: 'first-password-123', teamName: 'Kestrel Ridge Fine Chemicals — Process Development' },
  });
  expect(signUp.status()).toBe(201);

  await page.goto('/sign-in');
  await page.getByRole('link', { name: 'Forgot your password?' }).click();
  await expect(page).toHaveURL(/\/forgot-password$/);
  await page.getByLabel('E-mail').fill(email);
  await page.getByRole('button', { name: 'Send reset link' }).click();
  await expect(page.getByRole('status').filter({ hasText: 'If an account uses that address' })).toBeVisible();

  let link: string | null = null;
  await expect
    .poll(() => {
      const mail = readMailbox(E2E_MAIL_DIR).find((m) => m.to.includes(email) && m.subject.includes('Reset'));
      link = mail?.text.match(/https?:\/\/\S+\/reset-password\/[A-Za-z0-9_-]+/)?.[0] ?? null;
      return link;
    }, { message: `a reset mail to ${email}` })
    .not.toBeNull();

  await page.goto(link!);
  await page.getByLabel('New password').fill('second-password-456');
  await page.getByRole('button', { name: 'Set new password' }).click();
  await expect(page.getByRole('status').filter({ hasText: 'Your password is changed' })).toBeVisible();

  await page.goto(link!);
  await expect(page.getByText('already been used')).toBeVisible();

  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill('first-password-123');
  await page.getByRole('button', { name: 'Sign in' }).click();
  await expect(page.getByRole('alert').filter({ hasText: 'do not match' })).toBeVisible();
  await signIn(page, email, 'second-password-456');
  expect(violations).toEqual([]);
});

test('sign out everywhere from Settings ends the session in another browser too', async ({ browser, request }) => {
  const email = `everywhere-${Date.now()}@kestrel-ridge.example`;
  const password = 'a-strong-password-1';
  expect((await request.post('/api/signup', { data: { name: 'Baptiste Osei', email, password, teamName: 'Kestrel Ridge Fine Chemicals — Process Development' } })).status()).toBe(201);
  const laptop = await (await browser.newContext()).newPage();
  const phone = await (await browser.newContext()).newPage();
  const violations = await watchViolations(laptop);
  await signIn(laptop, email, password);
  await signIn(phone, email, password);

  await laptop.goto('/settings');
  await laptop.getByRole('button', { name: 'Sign out everywhere' }).click();
  await expect(laptop).toHaveURL(/\/sign-in/);
  await phone.goto('/routes');
  await expect(phone).toHaveURL(/\/sign-in/);
  expect(violations).toEqual([]);
});
