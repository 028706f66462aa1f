// Structures where chemists look, and estimates that never pass for measured data: the demo's estimated routes
// show drawings on their nodes (larger on keyboard focus), in the palette, in compare and in the printable report,
// every drawing with a name-and-formula text alternative; the ladder's CSV carries the steps' data origins.
import fs from 'node:fs';
import { expect, test, type Locator, type Page } from '@playwright/test';
import { DEMO_PASSWORD, DEMO_USERS } from '../../db/seeders/demo-team';
import { signIn } from './support/auth';

const designer = DEMO_USERS.find((u) => u.role === 'designer')!.email;
// "name (Formula)": the alt every structure drawing carries.
const NAME_AND_FORMULA = /^\S.* \((?:[A-Z][a-z]?\d*)+\)$/;

test.use({ viewport: { width: 1440, height: 1100 } });

async function routeId(page: Page, search: string): Promise<number> {
  const answer = (await (await page.request.get(`/api/routes?q=${encodeURIComponent(search)}`)).json()) as { items: { id: number }[] };
  expect(answer.items.length).toBeGreaterThan(0);
  return answer.items[0]!.id;
}

async function expectNamedDrawings(scope: Locator, atLeast: number) {
  const drawings = scope.locator('img[src^="/api/structures/svg"]');
  await expect(drawings.first()).toBeVisible();
  // One read of every alt at once: the palette's list can still be narrowing to the filter between two reads.
  const alts = await drawings.evaluateAll((imgs) => imgs.map((img) => img.getAttribute('alt') ?? ''));
  expect(alts.length).toBeGreaterThanOrEqual(atLeast);
  for (const alt of alts) expect(alt).toMatch(NAME_AND_FORMULA);
}

test('the estimated demo route shows named drawings on its nodes, larger on focus, and origins in its CSV', async ({ page }) => {
  await signIn(page, designer, DEMO_PASSWORD);
  const id = await routeId(page, 'KR-117');
  await page.goto(`/routes/${id}`);
  const strips = page.getByTestId('structure-strip');
  await expect(strips.first()).toBeVisible();
  await expectNamedDrawings(page.getByTestId('route-canvas'), 3);
  // The aniline series under the names the identifier table gives it, and the carbamate no table has under the name
  // its structure is bound with (formulas from the structures).
  const canvasDrawings = page.getByTestId('route-canvas').locator('img[src^="/api/structures/svg"]');
  await expect
    .poll(() => canvasDrawings.evaluateAll((imgs) => imgs.map((img) => img.getAttribute('alt') ?? '')))
    .toEqual(expect.arrayContaining(['4-nitroaniline (C6H6N2O2)', "4'-aminoacetanilide (C8H10N2O)", 'tert-butyl N-(4-acetamidophenyl)carbamate (C13H18N2O3)']));

  // Keyboard focus opens the larger view; Escape closes it.
  await strips.first().focus();
  const enlarged = page.getByTestId('structure-enlarged');
  await expect(enlarged).toBeVisible();
  await expectNamedDrawings(enlarged, 1);
  await page.keyboard.press('Escape');
  await expect(enlarged).toHaveCount(0);

  // The node's estimate mark is still there beside the drawings.
  await expect(page.getByTestId('step-estimate-mark').first()).toBeVisible();

  const download = page.waitForEvent('download');
  await page.getByRole('button', { name: 'Export CSV' }).click();
  const csv = fs.readFileSync((await (await download).path())!, 'utf8');
  const [header, ...rows] = csv.replace(/^\uFEFF/, '').trim().split(/\r?\n/);
  for (const column of ['data_origin', 'estimated_species', 'estimation_method', 'sigma_dG_kJ_per_mol', 'sign_within_sigma']) expect(header).toContain(column);
  expect(rows.some((r) => /,(estimated|mixed),/.test(r))).toBe(true);
});

test('the palette shows entries with named drawings', async ({ page }) => {
  await signIn(page, designer, DEMO_PASSWORD);
  await page.goto(`/routes/${await routeId(page, 'KR-117')}`);
  const palette = page.getByRole('complementary', { name: 'Step palette' });
  await palette.getByLabel('Reactions with species').fill('C2H5OH(g)');
  await expect(palette.getByTestId('palette-item').filter({ hasText: 'Ethylene hydration' })).toBeVisible();
  await expectNamedDrawings(palette, 1);
});

test('compare and its printable report draw each step and say where its values came from', async ({ page }) => {
  await signIn(page, designer, DEMO_PASSWORD);
  const ids = [await routeId(page, 'KR-117'), await routeId(page, 'ketoreductase')];
  await page.goto(`/routes/compare?ids=${ids.join(',')}`);
  const steps = page.getByTestId('compare-step');
  await expect(steps.first()).toBeVisible();
  await expectNamedDrawings(page.locator('.compare-card').first(), 2);
  // Estimates: the mark's word plus the method and σ in visible words, not colour alone.
  await expect(page.locator('[data-testid="compare-step"] [data-origin="estimated"]').first()).toContainText('Estimate');
  await expect(steps.filter({ hasText: 'σ(ΔrG°)' }).first()).toBeVisible();

  await page.getByRole('link', { name: 'Printable report' }).click();
  await expect(page.getByRole('heading', { name: 'Route comparison' })).toBeVisible();
  await expectNamedDrawings(page.locator('article.report'), 2);
  await expect(page.locator('article.report [data-origin="estimated"]').first()).toBeVisible();
});
