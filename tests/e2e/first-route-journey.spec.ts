// The first journey of a new route designer, counted in actions from the sign-in page: sign in → new route → three
// steps from the palette → link them → each step's ΔG → the uphill step on the ladder → a remedy → a downhill route.
// Every click, fill, key press or selection made as the user counts one (`act`); waiting and reading do not.
//
// Chemistry: methane → synthesis gas → methanol → formaldehyde, the industrial path (steam reforming, methanol
// synthesis, oxidative dehydrogenation over a metal-oxide catalyst; any industrial chemistry text, from memory).
// At the default 298.15 K steam reforming is uphill: ΔG° ≈ +142 kJ/mol (ΔH° ≈ +206 kJ/mol, ΔS° ≈ +215 J/(mol·K),
// standard tables, from memory), and it turns downhill only near 900 K and above, which is why reformers run hot.
// The engine agrees (npm run -s thermo -- route, default threshold −17 kJ/mol): +142.1 kJ/mol at 298.15 K, the
// temperature remedy offers 961 K (−17.2 kJ/mol); methanol synthesis −24.8 and the oxidation −169.7 kJ/mol stay
// downhill at 298.15 K, and the route total is then about −212 kJ per mol of formaldehyde.
import { expect, test } from '@playwright/test';
import { DEMO_PASSWORD, DEMO_USERS } from '../../db/seeders/demo-team';

const designer = DEMO_USERS.find((u) => u.role === 'designer')!.email;
const MAX_ACTIONS = 20;

test.use({ viewport: { width: 1440, height: 1100 } });

const STEPS = [
  { palette: 'Steam reforming of methane', title: 'Step 1 (steam reforming of methane)' },
  { palette: 'Methanol from carbon monoxide', title: 'Step 2 (methanol from carbon monoxide)' },
  { palette: 'Oxidative dehydrogenation of methanol', title: 'Step 3 (oxidative dehydrogenation of methanol)' },
] as const;

const escape = (text: string) => text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
/** A node's accessible name: "Step 1 (…): ΔG° +142.1 kJ/mol, uphill; at 298 K". */
const nodeName = (title: string, cls: string) => new RegExp(`^${escape(title)}: ΔG°? [^,;]*\\d[^,;]*, ${cls}`);

/** Counts the user's actions: each call is one click, fill, key press or selection, logged with its name. */
function actionCounter() {
  let count = 0;
  const act = async <T>(name: string, fn: () => Promise<T>): Promise<T> => {
    count += 1;
    console.log(`action ${count}: ${name}`);
    test.info().annotations.push({ type: 'action', description: `${count}. ${name}` });
    return fn();
  };
  return { act, count: () => count };
}

test('a new designer builds a three-step route, finds the uphill step and fixes it in at most 20 actions', async ({ page }) => {
  test.setTimeout(120_000);
  const { act, count } = actionCounter();
  const routeName = `Formaldehyde from methane ${Date.now().toString(36)}`;

  // Sign in.
  await page.goto('/sign-in');
  await act('fill e-mail', () => page.getByLabel('E-mail').fill(designer));
  await act('fill password', () => page.getByLabel('Password').fill(DEMO_PASSWORD));
  await act('click Sign in', () => page.getByRole('button', { name: 'Sign in' }).click());
  await expect(page).toHaveURL(/\/routes$/);

  // New route.
  await act('click New route', () => page.getByRole('button', { name: 'New route' }).first().click());
  const dialog = page.getByRole('dialog', { name: 'New route' });
  await act('fill route name', () => dialog.getByLabel('Name').fill(routeName));
  await act('fill target species', () => dialog.getByLabel('Target species').fill('HCHO(g)'));
  await act('click Create route', () => dialog.getByRole('button', { name: 'Create route' }).click());
  await expect(page).toHaveURL(/\/routes\/\d+$/);
  await expect(page.getByRole('heading', { name: routeName })).toBeVisible();

  // Three steps from the palette, each a click on its Add button.
  const nodes = page.locator('.react-flow__node');
  for (const [i, step] of STEPS.entries()) {
    await act(`add "${step.palette}" from the palette`, () => page.getByRole('button', { name: new RegExp(`^Add step: ${escape(step.palette)}`) }).click());
    await expect(nodes).toHaveCount(i + 1);
  }
  // New steps land in free space: no two nodes overlap.
  const boxes = await nodes.evaluateAll((els) => els.map((el) => el.getBoundingClientRect()).map((r) => ({ x: r.x, y: r.y, w: r.width, h: r.height })));
  for (const [i, a] of boxes.entries()) {
    for (const b of boxes.slice(i + 1)) expect(a.x + a.w <= b.x || b.x + b.w <= a.x || a.y + a.h <= b.y || b.y + b.h <= a.y).toBe(true);
  }

  // Link them: the board offers the three links where one step makes what the next needs.
  const suggestions = page.getByRole('region', { name: 'Suggested links' });
  await expect(suggestions).toContainText('CO(g) from Step 1 to Step 2');
  await expect(suggestions).toContainText('CH3OH(g) from Step 2 to Step 3');
  await act('click Make these 3 links', () => suggestions.getByRole('button', { name: 'Make these 3 links' }).click());
  await expect(page.locator('.react-flow__edge')).toHaveCount(3);
  await expect(suggestions).toHaveCount(0);

  // Each step's ΔG, on its node (numbered in route order, named in words for screen readers).
  await expect(page.getByRole('button', { name: nodeName(STEPS[0].title, 'uphill') })).toBeVisible({ timeout: 30_000 });
  await expect(page.getByRole('button', { name: nodeName(STEPS[1].title, 'downhill') })).toBeVisible();
  await expect(page.getByRole('button', { name: nodeName(STEPS[2].title, 'downhill') })).toBeVisible();
  for (const node of await nodes.all()) await expect(node).toContainText(/ΔG°?\s*[+−-]?\d/);

  // The uphill step on the ladder: one riser says so; selecting it opens its remedies.
  const ladder = page.getByRole('region', { name: 'Free-energy ladder' });
  await expect(ladder.locator('figcaption')).toContainText('Route ΔG', { timeout: 30_000 });
  const uphill = ladder.getByRole('button', { name: /; uphill;/ });
  await expect(uphill).toHaveCount(1);
  await expect(uphill).toHaveAccessibleName(/^Step 1,/);
  await act('select the uphill riser on the ladder', () => uphill.click());

  // A remedy: the temperature that brings the step past the route's downhill threshold.
  const remedies = page.getByRole('complementary', { name: /^Remedies for Step 1/ });
  await act('click Use this temperature', () => remedies.getByRole('button', { name: /Use this temperature/ }).first().click());

  // The route is downhill: every riser downhill, none uphill or marginal, and the total below zero.
  await expect(ladder.getByRole('button', { name: /; downhill;/ })).toHaveCount(3, { timeout: 30_000 });
  await expect(ladder.getByRole('button', { name: /; (uphill|marginal);/ })).toHaveCount(0);
  await expect(ladder.locator('figcaption')).toContainText(/Route ΔG\s*[−-]\s?\d/);
  await expect(page.getByRole('button', { name: nodeName(STEPS[0].title, 'downhill') })).toBeVisible();
  await expect(page.getByRole('textbox', { name: /Temperature/ }).first()).toHaveValue(/^9\d\d/);

  // Nothing people read names a step by its internal id.
  expect(await page.locator('body').innerText()).not.toMatch(/\bs-[0-9a-f]{8}\b/);

  console.log(`journey: ${count()} actions`);
  expect(count()).toBeLessThanOrEqual(MAX_ACTIONS);
});
