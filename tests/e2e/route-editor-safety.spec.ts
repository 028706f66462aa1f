import { expect, test, type APIRequestContext, type Page } from '@playwright/test';
import { DEMO_PASSWORD, DEMO_USERS } from '../../db/seeders/demo-team';
import { signIn } from './support/auth';

const designer = DEMO_USERS.find((u) => u.role === 'designer')!.email;
const STEP = { id: 's1', equation: 'CO(g) + 2 H2(g) -> CH3OH(g)', temperature: '500 K', yieldPct: 100, notes: '', position: { x: 40, y: 40 } };

interface RouteDoc {
  id: number;
  version: number;
  name: string;
  archived: boolean;
  steps: Array<{ id: string; temperature?: string }>;
}

async function makeRoute(request: APIRequestContext, name: string): Promise<RouteDoc> {
  const created = await request.post('/api/routes', { data: { name, target: 'CH3OH(g)', targetAmount: '1 mol' } });
  expect(created.status()).toBe(201);
  const { id, version } = (await created.json()) as RouteDoc;
  const saved = await request.put(`/api/routes/${id}`, {
    data: { version, name, target: 'CH3OH(g)', targetAmount: '1 mol', marginalThreshold_kJ: -17, steps: [STEP], links: [] },
  });
  expect(saved.status()).toBe(200);
  return ((await saved.json()) as { route: RouteDoc }).route;
}

const readRoute = async (request: APIRequestContext, id: number) => (await (await request.get(`/api/routes/${id}`)).json()) as RouteDoc;

async function openStep(page: Page, id: number) {
  await page.goto(`/routes/${id}`);
  await page.locator('.react-flow__node[data-id="s1"] [data-testid="step-equation"]').click();
  return page.getByRole('textbox', { name: /Temperature/ });
}

test.beforeEach(async ({ page }) => {
  await signIn(page, designer, DEMO_PASSWORD);
});

test('a save against a version changed elsewhere offers a copy, and the copy holds my edit while theirs stays', async ({ page }) => {
  const route = await makeRoute(page.request, 'E2E conflict route');
  const temperature = await openStep(page, route.id);
  await expect(page.getByText('Saved', { exact: true })).toBeVisible();

  // Another tab saves first.
  const theirs = await page.request.put(`/api/routes/${route.id}`, {
    data: { version: route.version, name: 'E2E conflict route (theirs)', target: 'CH3OH(g)', targetAmount: '1 mol', marginalThreshold_kJ: -17, steps: [STEP], links: [] },
  });
  expect(theirs.status()).toBe(200);

  await temperature.fill('450');
  const dialog = page.getByRole('dialog', { name: 'This route changed elsewhere' });
  await expect(dialog).toBeVisible({ timeout: 10_000 });
  await dialog.getByRole('button', { name: 'Keep mine as a copy' }).click();
  await expect(page).not.toHaveURL(new RegExp(`/routes/${route.id}$`));
  await expect(page.getByRole('heading', { name: /\(my copy\)$/ })).toBeVisible();

  const copyId = Number(new URL(page.url()).pathname.split('/').pop());
  const copy = await readRoute(page.request, copyId);
  expect(copy.steps[0]?.temperature).toBe('450 K');
  const original = await readRoute(page.request, route.id);
  expect(original.name).toBe('E2E conflict route (theirs)');
  expect(original.steps[0]?.temperature).toBe('500 K');
});

test('"Reload theirs" shows the other save and drops mine', async ({ page }) => {
  const route = await makeRoute(page.request, 'E2E reload route');
  const temperature = await openStep(page, route.id);
  await expect(page.getByText('Saved', { exact: true })).toBeVisible();
  const theirs = await page.request.put(`/api/routes/${route.id}`, {
    data: { version: route.version, name: 'E2E reload route', target: 'CH3OH(g)', targetAmount: '1 mol', marginalThreshold_kJ: -17, steps: [{ ...STEP, temperature: '520 K' }], links: [] },
  });
  expect(theirs.status()).toBe(200);
  await temperature.fill('430');
  const dialog = page.getByRole('dialog', { name: 'This route changed elsewhere' });
  await dialog.getByRole('button', { name: 'Reload theirs' }).click();
  await expect(dialog).toBeHidden();
  await page.locator('.react-flow__node[data-id="s1"] [data-testid="step-equation"]').click();
  await expect(page.getByRole('textbox', { name: /Temperature/ })).toHaveValue('520');
});

test('an edit followed at once by an in-app link is still saved', async ({ page }) => {
  const route = await makeRoute(page.request, 'E2E leave quickly');
  const temperature = await openStep(page, route.id);
  await temperature.fill('480');
  await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Routes' }).click();
  await expect(page).toHaveURL(/\/routes$/);
  await expect.poll(async () => (await readRoute(page.request, route.id)).steps[0]?.temperature, { timeout: 10_000 }).toBe('480 K');
});

test('an archived route opens read-only and can be unarchived', async ({ page }) => {
  const route = await makeRoute(page.request, 'E2E archived route');
  expect((await page.request.post(`/api/routes/${route.id}/archive`, { data: { archived: true } })).status()).toBe(200);
  await page.goto(`/routes/${route.id}`);
  await expect(page.getByText('Archived: this route is read-only')).toBeVisible();
  await expect(page.getByTestId('palette-item')).toHaveCount(0);
  await expect(page.getByLabel('Route name')).toBeDisabled();
  await page.getByRole('button', { name: 'Unarchive' }).click();
  await expect(page.getByText('Archived: this route is read-only')).toBeHidden();
  await expect(page.getByTestId('palette-item').first()).toBeVisible();
  await expect(page.getByLabel('Route name')).toBeEnabled();
});

test('a designer deletes a route from the list; a lead brings it back from "Recently deleted"', async ({ page, browser }) => {
  const route = await makeRoute(page.request, `E2E deleted route ${Date.now()}`);
  await page.goto('/routes');
  await page.getByRole('button', { name: `Delete ${route.name}` }).click();
  const dialog = page.getByRole('dialog', { name: `Delete “${route.name}”?` });
  await expect(dialog).toContainText('A group lead can undo this for 30 days');
  await dialog.getByRole('button', { name: 'Delete route' }).click();
  await expect(page.getByRole('link', { name: route.name })).toHaveCount(0);
  expect((await page.request.get(`/api/routes/${route.id}`)).status()).toBe(404);
  await expect(page.getByRole('button', { name: 'Recently deleted' })).toHaveCount(0);

  const leadContext = await browser.newContext();
  const lead = await leadContext.newPage();
  await signIn(lead, DEMO_USERS.find((u) => u.role === 'lead')!.email, DEMO_PASSWORD);
  await lead.getByRole('button', { name: 'Recently deleted' }).click();
  await lead.getByRole('button', { name: `Undo delete of ${route.name}` }).click();
  await expect(lead.getByRole('button', { name: `Undo delete of ${route.name}` })).toHaveCount(0);
  expect((await lead.request.get(`/api/routes/${route.id}`)).status()).toBe(200);
  await leadContext.close();
});
