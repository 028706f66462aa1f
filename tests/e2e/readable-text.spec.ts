import { expect, test, type Page } from '@playwright/test';
import { DEMO_PASSWORD, DEMO_USERS } from '../../db/seeders/demo-team';
import { signIn } from './support/auth';

// Everything people read names steps as "Step n (what it does)" and writes numbers as a chemist would: no internal
// step ids ("s-8ab5e2fd"), no e-notation ("1.75e+6"), no hyphen-minus in front of a value ("-12.4 kJ").
// A route whose steps carry such ids is made first, with history, a comment, a mention and a flag, so the check can fail.

const email = (role: 'lead' | 'designer' | 'reviewer') => DEMO_USERS.find((u) => u.role === role)!.email;
const handle = (role: 'lead' | 'designer' | 'reviewer') => email(role).split('@')[0]!;

const STEP_IDS = ['s-8ab5e2fd', 's-c522bf8f'];
const STEP_ID = /\bs-[0-9a-f]{6,}\b/;
const E_NOTATION = /\d(\.\d+)?e[+-]?\d/i;
// A hyphen-minus that starts a number where a value stands (after a space, bracket, "=", ":" or an arrow). Dates
// ("2026-12-04") and ranges ("300-400 K") have a digit before the hyphen and are not matched.
const HYPHEN_MINUS_VALUE = /(^|[\s([=:→≈~])-\d/m;

async function expectReadable(page: Page, where: string) {
  // Wait until nothing on the page is still loading, then read what a person sees.
  await expect(page.getByText(/^(Loading|Comparing)…?/)).toHaveCount(0);
  const text = await page.evaluate(() => document.body.innerText);
  const context = (m: RegExpExecArray | null) => (m ? `…${text.slice(Math.max(0, m.index - 60), m.index + 60)}…` : '');
  expect(STEP_ID.exec(text), `${where} shows a step id: ${context(STEP_ID.exec(text))}`).toBeNull();
  expect(E_NOTATION.exec(text), `${where} shows e-notation: ${context(E_NOTATION.exec(text))}`).toBeNull();
  expect(HYPHEN_MINUS_VALUE.exec(text), `${where} shows a hyphen for minus: ${context(HYPHEN_MINUS_VALUE.exec(text))}`).toBeNull();
  for (const id of STEP_IDS) expect(text, `${where} names ${id}`).not.toContain(id);
}

const STEPS = (synthesisT: string) => [
  { id: 's-8ab5e2fd', equation: 'CH4(g) + H2O(g) -> CO(g) + 3 H2(g)', temperature: '1100 K', yieldPct: 95, notes: '', position: { x: 0, y: 0 } },
  { id: 's-c522bf8f', equation: 'CO(g) + 2 H2(g) -> CH3OH(g)', temperature: synthesisT, yieldPct: 90, notes: '', position: { x: 320, y: 0 } },
];
const LINKS = [
  { from: 's-8ab5e2fd', to: 's-c522bf8f', species: 'CO(g)' },
  { from: 's-8ab5e2fd', to: 's-c522bf8f', species: 'H2(g)' },
];

async function routeIdsByName(page: Page, q: string, prefixes: string[]): Promise<number[]> {
  const answer = await page.request.get(`/api/routes?q=${encodeURIComponent(q)}&pageSize=50`);
  expect(answer.ok()).toBe(true);
  const { items } = (await answer.json()) as { items: { id: number; name: string }[] };
  return prefixes.map((prefix) => {
    const found = items.find((r) => r.name.startsWith(prefix));
    expect(found, prefix).toBeTruthy();
    return found!.id;
  });
}

test('no page shows a step id, e-notation or a hyphen for minus', async ({ page, browser }) => {
  test.setTimeout(120_000);
  // The lead builds a route whose steps have board-style ids, edits it twice, comments with a mention and flags a step.
  await signIn(page, email('lead'), DEMO_PASSWORD);
  const name = `Readable text check ${Date.now()}`;
  const created = await page.request.post('/api/routes', { data: { name, target: 'CH3OH(g)', targetAmount: '1 mol' } });
  expect(created.status()).toBe(201);
  const { id: routeId, version: firstVersion } = (await created.json()) as { id: number; version: number };
  let version = firstVersion;
  for (const T of ['500 K', '650 K']) {
    const saved = await page.request.put(`/api/routes/${routeId}`, { data: { version, name, target: 'CH3OH(g)', targetAmount: '1 mol', marginalThreshold_kJ: -17, steps: STEPS(T), links: LINKS } });
    expect(saved.status()).toBe(200);
    version = ((await saved.json()) as { route: { version: number } }).route.version;
  }
  const commented = await page.request.post(`/api/routes/${routeId}/comments`, {
    data: { body: `@${handle('reviewer')} @${handle('designer')} is 650 K too hot for the Cu/ZnO bed?`, stepKey: 's-c522bf8f' },
  });
  expect(commented.status()).toBe(201);
  const flagged = await page.request.post(`/api/routes/${routeId}/flags`, { data: { stepKey: 's-8ab5e2fd', category: 'safety', reason: 'Reformer outlet at 1100 K needs a hazard review.' } });
  expect(flagged.status()).toBe(201);
  const [reforming, oxidation] = await routeIdsByName(page, 'Methanol via', ['Methanol via steam reforming', 'Methanol via partial oxidation']);

  // The reviewer reads every page.
  const context = await browser.newContext();
  const reader = await context.newPage();
  await signIn(reader, email('reviewer'), DEMO_PASSWORD);
  await expect(reader.getByRole('table', { name: 'Routes of your team' }).getByRole('row').nth(1)).toBeVisible();
  await expectReadable(reader, 'the routes list');

  // The inbox: the mention names the step by its label.
  const bell = reader.locator('details:has(> summary[aria-label^="Notifications"])');
  await bell.locator('summary').click();
  await expect(bell.getByText(new RegExp(`mentioned you on ${name}`))).toBeVisible();
  await expect(bell.getByText(/Step 2 \(methanol from carbon monoxide\)/).first()).toBeVisible();
  await expectReadable(reader, 'the inbox');
  await reader.keyboard.press('Escape');

  for (const [id, label] of [[routeId, 'the new route'], [reforming, 'the demo steam-reforming route']] as const) {
    await reader.goto(`/routes/${id}`);
    await expect(reader.getByRole('tab', { name: /^Discussion/ })).toBeVisible();
    await expectReadable(reader, `${label}: board and discussion`);
    for (const tab of ['Flags', 'History', 'Activity']) {
      await reader.getByRole('tab', { name: new RegExp(`^${tab}`) }).click();
      await expect(reader.getByRole('tabpanel')).toBeVisible();
      if (tab === 'History') {
        const ticks = reader.getByRole('checkbox', { name: /^Compare revision/ });
        if ((await ticks.count()) >= 2) {
          await ticks.nth(0).check();
          await ticks.nth(1).check();
          await expect(reader.getByText(/^Revision \d+ → \d+/)).toBeVisible();
        }
      }
      await expectReadable(reader, `${label}: ${tab.toLowerCase()}`);
    }
  }
  // The new route's history and activity say which step changed, by label.
  await reader.goto(`/routes/${routeId}`);
  await reader.getByRole('tab', { name: /^History/ }).click();
  await expect(reader.getByText(/T of Step 2 \(methanol from carbon monoxide\) 500 → 650 K/)).toBeVisible();

  await reader.goto(`/routes/compare?ids=${reforming},${oxidation}`);
  await expect(reader.getByRole('region', { name: 'Metrics of the compared routes' })).toBeVisible();
  await expectReadable(reader, 'compare');

  await reader.goto('/decisions');
  await expect(reader.getByText('Decisions are never edited.', { exact: false })).toBeVisible();
  await expectReadable(reader, 'the decision log');
  const firstDecision = reader.getByRole('link', { name: /^Decision #\d+/ }).first();
  if ((await firstDecision.count()) > 0) {
    await firstDecision.click();
    await expect(reader).toHaveURL(/\/decisions\/\d+$/);
    await expectReadable(reader, 'a decision');
  }

  await reader.goto('/species');
  await expect(reader.getByRole('link', { name: /values, plot and routes/ }).first()).toBeVisible();
  await expectReadable(reader, 'the species list');
  await reader.goto(`/species/${encodeURIComponent('CH3OH(g)')}`);
  await expect(reader.getByRole('heading', { name: 'Routes of your team that use it' })).toBeVisible();
  await expect(reader.getByRole('link', { name: 'Step 2 (methanol from carbon monoxide)' }).first()).toBeVisible();
  await expectReadable(reader, 'the methanol species page');

  await reader.goto('/settings');
  await expect(reader.getByRole('heading', { level: 1, name: 'Settings' })).toBeVisible();
  await expectReadable(reader, 'settings');
  await context.close();
});
