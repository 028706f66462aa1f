import fs from 'node:fs';
import { expect, test, type APIRequestContext } from '@playwright/test';
import { DEMO_PASSWORD, DEMO_USERS } from '../../db/seeders/demo-team';
import { signIn } from './support/auth';

const email = (role: 'lead' | 'reviewer') => DEMO_USERS.find((u) => u.role === role)!.email;
const METHANOL = { id: 'm', equation: 'CO(g) + 2 H2(g) -> CH3OH(g)', temperature: '500 K', yieldPct: 100, notes: '', position: { x: 300, y: 0 } };

async function makeRoute(request: APIRequestContext, name: string, feed: { equation: string; temperature: string }) {
  const created = await request.post('/api/routes', { data: { name, target: 'CH3OH(g)', targetAmount: '1 mol' } });
  const { id, version } = (await created.json()) as { id: number; version: number };
  const steps = [{ id: 'f', ...feed, yieldPct: 100, notes: '', position: { x: 0, y: 0 } }, METHANOL];
  const links = [
    { from: 'f', to: 'm', species: 'CO(g)' },
    { from: 'f', to: 'm', species: 'H2(g)' },
  ];
  expect((await request.put(`/api/routes/${id}`, { data: { version, name, target: 'CH3OH(g)', targetAmount: '1 mol', marginalThreshold_kJ: -17, steps, links } })).status()).toBe(200);
  return id;
}

test.use({ viewport: { width: 1440, height: 1100 } });

test('a lead compares two routes on one scale, tries a what-if, exports CSV and records a decision', async ({ page }) => {
  await signIn(page, email('lead'), DEMO_PASSWORD);
  const stamp = Date.now();
  const reforming = await makeRoute(page.request, `E2E reforming ${stamp}`, { equation: 'CH4(g) + H2O(g) -> CO(g) + 3 H2(g)', temperature: '750 K' });
  const oxidation = await makeRoute(page.request, `E2E oxidation ${stamp}`, { equation: 'CH4(g) + 1/2 O2(g) -> CO(g) + 2 H2(g)', temperature: '1100 K' });
  await page.goto(`/routes/compare?ids=${reforming},${oxidation}`);

  await expect(page.getByRole('figure', { name: `Ladder of E2E reforming ${stamp}` })).toBeVisible();
  await expect(page.getByRole('figure', { name: `Ladder of E2E oxidation ${stamp}` })).toBeVisible();
  // The methanol step is in both routes: marked shared on each ladder.
  await expect(page.locator('[data-shared="true"]')).toHaveCount(2);
  const uphillRow = page.locator('tr[data-metric="uphillSteps"]');
  await expect(uphillRow).toContainText('best');

  // What-if: +50 K on every step, recomputed on the server, the saved routes untouched.
  const before = await page.locator('tr[data-metric="overallDeltaG_kJ"]').innerText();
  await page.getByLabel('Temperature offset (K)').fill('50');
  await page.getByRole('button', { name: 'Recompute' }).click();
  await expect(page.getByText(/What-if in force: every temperature \+50 K/)).toBeVisible();
  await expect(page.locator('tr[data-metric="overallDeltaG_kJ"]')).not.toHaveText(before);
  const saved = (await (await page.request.get(`/api/routes/${reforming}`)).json()) as { steps: { temperature: string }[] };
  expect(saved.steps[0]!.temperature).toBe('750 K');

  await page.getByLabel('Standard ΔG°').check();
  await expect(page.getByRole('img', { name: new RegExp(`E2E reforming ${stamp}: standard ΔG°`) })).toBeVisible();

  const download = page.waitForEvent('download');
  await page.getByRole('button', { name: 'Download CSV' }).click();
  const csv = fs.readFileSync((await (await download).path())!, 'utf8');
  expect(csv).toContain(`E2E reforming ${stamp}`);
  expect(csv).toContain('Uphill steps');

  // A decision needs a rationale.
  const decision = page.getByRole('form', { name: 'Record the decision' });
  await decision.getByLabel(`E2E oxidation ${stamp}`).check();
  await decision.getByRole('button', { name: 'Record decision' }).click();
  await expect(decision.getByText('Say why this route was chosen.')).toBeVisible();
  await decision.getByLabel('Rationale').fill('No uphill step and no coupling needed; reforming needs a driver at 750 K.');
  await decision.getByLabel('Shelve the other routes').check();
  await decision.getByRole('button', { name: 'Record decision' }).click();
  await expect(page.getByText(/Decision #\d+ recorded/)).toBeVisible();
  const shelved = (await (await page.request.get(`/api/routes/${reforming}`)).json()) as { status: string };
  expect(shelved.status).toBe('shelved');

  await page.goto(`/routes/compare/report?ids=${reforming},${oxidation}`);
  await expect(page.getByRole('heading', { name: 'Route comparison' })).toBeVisible();
  await expect(page.getByRole('region', { name: 'Decision' })).toContainText('No uphill step and no coupling needed');
  await expect(page.getByText('A thermodynamic screen only', { exact: true })).toBeVisible();

  await page.goto('/decisions');
  await expect(page.getByRole('table')).toContainText('No uphill step and no coupling needed');
});

test('the lead ticks the two demo routes on the list, compares them at +50 K, records a decision and finds it in the log', async ({ page }) => {
  await signIn(page, email('lead'), DEMO_PASSWORD);
  const demo = ['Methanol via steam reforming (Line 2 proposal)', 'Methanol via partial oxidation (alternative)'];
  for (const name of demo) await page.getByRole('checkbox', { name: `Select ${name} to compare` }).check();
  await page.getByRole('button', { name: 'Compare selected (2)' }).click();
  await expect(page).toHaveURL(/\/routes\/compare\?ids=/);
  for (const name of demo) await expect(page.getByRole('figure', { name: `Ladder of ${name}` })).toBeVisible();
  await expect(page.getByRole('table')).toContainText('Overall ΔG');

  await page.getByLabel('Temperature offset (K)').fill('50');
  await page.getByRole('button', { name: 'Recompute' }).click();
  await expect(page.getByText(/What-if in force: every temperature \+50 K/)).toBeVisible();

  const rationale = `Demo check ${Date.now()}: partial oxidation runs downhill at every step, even 50 K hotter.`;
  const decision = page.getByRole('form', { name: 'Record the decision' });
  await decision.getByLabel(demo[1]!).check();
  await decision.getByLabel('Rationale').fill(rationale);
  await decision.getByRole('button', { name: 'Record decision' }).click();
  await expect(page.getByText(/Decision #\d+ recorded/)).toBeVisible();
  await page.getByRole('link', { name: 'decision log' }).click();
  await expect(page).toHaveURL(/\/decisions$/);
  await expect(page.getByRole('row').filter({ hasText: rationale })).toContainText(demo[1]!);
});

test('bad comparisons get a clear message, and a reviewer sees no decision form', async ({ page }) => {
  await signIn(page, email('reviewer'), DEMO_PASSWORD);
  await page.goto('/routes/compare?ids=1');
  await expect(page.getByText('Choose at least 2 routes to compare.')).toBeVisible();
  await page.goto('/routes/compare?ids=1,2,3,4,5');
  await expect(page.getByText('Compare at most 4 routes at once.')).toBeVisible();
  await page.goto('/routes/compare?ids=abc');
  await expect(page.getByText('No routes to compare')).toBeVisible();
  const list = (await (await page.request.get('/api/routes?pageSize=2')).json()) as { items: { id: number }[] };
  await page.goto(`/routes/compare?ids=${list.items.map((r) => r.id).join(',')}`);
  await expect(page.getByRole('table')).toBeVisible();
  await expect(page.getByRole('form', { name: 'Record the decision' })).toHaveCount(0);
});

test('alternatives lead to a comparison; a route travels as JSON and comes back through the importer', async ({ page }) => {
  await signIn(page, email('lead'), DEMO_PASSWORD);
  const stamp = Date.now();
  const original = await makeRoute(page.request, `E2E original ${stamp}`, { equation: 'CH4(g) + H2O(g) -> CO(g) + 3 H2(g)', temperature: '1000 K' });
  const copy = (await (await page.request.post(`/api/routes/${original}/duplicate`, { data: {} })).json()) as { id: number };

  await page.goto(`/routes/${original}`);
  await page.getByRole('button', { name: /^Alternatives \(1\)/ }).click();
  await page.getByRole('link', { name: 'Compare these' }).click();
  await expect(page).toHaveURL(new RegExp(`/routes/compare\\?ids=${original}(%2C|,)${copy.id}$`));
  await expect(page.getByRole('table')).toBeVisible();

  // Export, then import the same file as a new route.
  const exported = await page.request.get(`/api/routes/${original}/export`);
  expect(exported.status()).toBe(200);
  const file = test.info().outputPath('route.json');
  fs.writeFileSync(file, await exported.text());
  await page.goto('/routes');
  await page.getByRole('button', { name: 'Import route JSON' }).click();
  await page.getByLabel('Route file').setInputFiles(file);
  await page.getByRole('button', { name: 'Import route', exact: true }).click();
  await expect(page).toHaveURL(/\/routes\/\d+$/);
  expect(page.url()).not.toMatch(new RegExp(`/routes/${original}$`));
  await expect(page.getByRole('heading', { level: 1 })).toContainText(`E2E original ${stamp}`);
  await expect(page.locator('.react-flow__node')).toHaveCount(2);

  // A malformed file is refused before anything is sent.
  const bad = test.info().outputPath('bad.json');
  fs.writeFileSync(bad, '{ "target": ');
  await page.goto('/routes');
  await page.getByRole('button', { name: 'Import route JSON' }).click();
  await page.getByLabel('Route file').setInputFiles(bad);
  await expect(page.getByText(/Nothing was sent/)).toBeVisible();
});

test('a reviewer reads the decision log with the rationale, and cannot record one', async ({ page, browser }) => {
  await signIn(page, email('lead'), DEMO_PASSWORD);
  const stamp = Date.now();
  const a = await makeRoute(page.request, `E2E log a ${stamp}`, { equation: 'CH4(g) + H2O(g) -> CO(g) + 3 H2(g)', temperature: '1000 K' });
  const b = await makeRoute(page.request, `E2E log b ${stamp}`, { equation: 'CH4(g) + 1/2 O2(g) -> CO(g) + 2 H2(g)', temperature: '1000 K' });
  const rationale = `Log check ${stamp}: route b needs no driver.`;
  expect((await page.request.post('/api/decisions', { data: { routeIds: [a, b], chosenRouteId: b, rationale } })).status()).toBe(201);

  const context = await browser.newContext();
  const reviewer = await context.newPage();
  await signIn(reviewer, email('reviewer'), DEMO_PASSWORD);
  expect((await reviewer.request.post('/api/decisions', { data: { routeIds: [a, b], chosenRouteId: a, rationale: 'not mine to make' } })).status()).toBe(403);
  await reviewer.goto('/decisions');
  const row = reviewer.getByRole('row').filter({ hasText: rationale });
  await expect(row).toContainText(`E2E log b ${stamp}`);
  await expect(reviewer.getByText(/never edited/i)).toBeVisible();
  await context.close();
});
