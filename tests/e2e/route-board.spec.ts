import { expect, test, type Locator, type Page } from '@playwright/test';
import { DEMO_PASSWORD, DEMO_USERS } from '../../db/seeders/demo-team';
import { signIn } from './support/auth';

const emailOf = (role: 'designer' | 'reviewer') => DEMO_USERS.find((u) => u.role === role)!.email;

// Library chemistry: reforming is downhill at 1000 K; methanol synthesis is uphill at 600 K and downhill when cooled.
const REFORMING = { name: 'Steam reforming of methane', equation: 'CH4(g) + H2O(g) -> CO(g) + 3 H2(g)' };
const METHANOL = { name: 'Methanol from carbon monoxide', equation: 'CO(g) + 2 H2(g) -> CH3OH(g)' };
const FORMALDEHYDE = { name: 'Oxidative dehydrogenation of methanol', equation: 'CH3OH(g) + 1/2 O2(g) -> HCHO(g) + H2O(g)' };

test.use({ viewport: { width: 1440, height: 1100 } });

async function dropFromPalette(page: Page, reaction: { name: string; equation: string }, at: { x: number; y: number }) {
  const nodes = page.locator('.react-flow__node');
  const before = await nodes.count();
  const item = page.getByTestId('palette-item').filter({ hasText: reaction.name }).first();
  await item.scrollIntoViewIfNeeded();
  await item.dragTo(page.getByTestId('route-canvas'), { targetPosition: at });
  await expect(nodes).toHaveCount(before + 1);
  await expect(nodes.last()).toContainText(reaction.equation);
}

function node(page: Page, id: string): Locator {
  return page.locator(`.react-flow__node[data-id="${id}"]`);
}

async function connect(page: Page, from: string, species: string, to: string) {
  const source = node(page, from).locator(`[data-handleid="p:${species}"]`);
  const target = node(page, to).locator(`[data-handleid="r:${species}"]`);
  await dragBetween(page, source, target);
}

async function dragBetween(page: Page, source: Locator, target: Locator) {
  const a = (await source.boundingBox())!;
  const b = (await target.boundingBox())!;
  await page.mouse.move(a.x + a.width / 2, a.y + a.height / 2);
  await page.mouse.down();
  await page.mouse.move((a.x + b.x) / 2, (a.y + b.y) / 2, { steps: 5 });
  await page.mouse.move(b.x + b.width / 2, b.y + b.height / 2, { steps: 5 });
  await page.mouse.up();
}

async function setTemperature(page: Page, id: string, kelvin: string) {
  await node(page, id).getByTestId('step-equation').click();
  const field = page.getByRole('textbox', { name: /Temperature/ });
  await field.fill(kelvin);
}

const ladderMark = (page: Page, id: string) => page.getByRole('region', { name: 'Free-energy ladder' }).locator(`[data-step-id="${id}"]`);

test('a designer builds a three-step route, remedies an uphill step, and finds it all after a reload', async ({ page }) => {
  await signIn(page, emailOf('designer'), DEMO_PASSWORD);

  await page.getByRole('button', { name: 'New route' }).first().click();
  const dialog = page.getByRole('dialog', { name: 'New route' });
  await dialog.getByLabel('Name').fill('E2E formaldehyde from methane');
  await dialog.getByLabel('Target species').fill('HCHO(g)');
  await dialog.getByRole('button', { name: 'Create route' }).click();
  await expect(page).toHaveURL(/\/routes\/\d+$/);
  await expect(page.getByRole('heading', { name: 'E2E formaldehyde from methane' })).toBeVisible();
  await expect(page.getByText('A thermodynamic screen only')).toBeVisible();

  // A new route's board is at 1:1, so these drop points keep the three nodes apart.
  await dropFromPalette(page, REFORMING, { x: 60, y: 60 });
  await dropFromPalette(page, METHANOL, { x: 440, y: 60 });
  await dropFromPalette(page, FORMALDEHYDE, { x: 60, y: 330 });
  await expect(page.locator('.react-flow__node')).toHaveCount(3);
  const [reform, methanol, formaldehyde] = await page.locator('.react-flow__node').evaluateAll((els) => els.map((el) => el.getAttribute('data-id')!));

  // A product linked to a different species is refused, with a reason.
  await dragBetween(page, node(page, reform!).locator('[data-handleid="p:H2(g)"]'), node(page, formaldehyde!).locator('[data-handleid="r:O2(g)"]'));
  await expect(page.getByRole('alert').filter({ hasText: 'Link a product of one step to the same species consumed by the next' })).toBeVisible();
  await expect(page.locator('.react-flow__edge')).toHaveCount(0);

  await connect(page, reform!, 'CO(g)', methanol!);
  await connect(page, reform!, 'H2(g)', methanol!);
  await connect(page, methanol!, 'CH3OH(g)', formaldehyde!);
  await expect(page.locator('.react-flow__edge')).toHaveCount(3);

  await setTemperature(page, reform!, '1000');
  await expect(node(page, reform!).getByText('downhill')).toBeVisible();
  await setTemperature(page, methanol!, '600');
  await expect(node(page, methanol!).getByText('uphill')).toBeVisible();
  await expect(ladderMark(page, methanol!)).toHaveAttribute('aria-label', /uphill/);

  // The temperature remedy first reaches ΔG < 0 (maybe still marginal); a second one clears the threshold.
  const remedies = page.getByRole('complementary', { name: /Remedies for/ });
  for (let i = 0; i < 3; i++) {
    const label = (await ladderMark(page, methanol!).getAttribute('aria-label')) ?? '';
    if (/downhill/.test(label)) break;
    await remedies.getByRole('button', { name: /Use this temperature/ }).first().click();
    await expect(ladderMark(page, methanol!)).not.toHaveAttribute('aria-label', label);
  }
  await expect(ladderMark(page, methanol!)).toHaveAttribute('aria-label', /downhill/);
  await expect(node(page, methanol!).getByText('downhill')).toBeVisible();
  const cooled = await page.getByRole('textbox', { name: /Temperature/ }).inputValue();
  expect(Number(cooled)).toBeLessThan(600);

  await expect(page.getByTestId('save-status')).toHaveText('Saved', { timeout: 15_000 });
  await page.reload();
  await expect(page.locator('.react-flow__node')).toHaveCount(3);
  await expect(page.locator('.react-flow__edge')).toHaveCount(3);
  await expect(node(page, methanol!).getByText('downhill')).toBeVisible();
  await expect(ladderMark(page, methanol!)).toHaveAttribute('aria-label', /downhill/);
  await node(page, methanol!).getByTestId('step-equation').click();
  await expect(page.getByRole('textbox', { name: /Temperature/ })).toHaveValue(cooled);

  // Keyboard: Delete removes the selected step with its link; Ctrl+Z brings both back.
  await node(page, formaldehyde!).getByTestId('step-equation').click();
  await page.keyboard.press('Delete');
  await expect(page.locator('.react-flow__node')).toHaveCount(2);
  await expect(page.locator('.react-flow__edge')).toHaveCount(2);
  await page.keyboard.press('Control+z');
  await expect(page.locator('.react-flow__node')).toHaveCount(3);
  await expect(page.locator('.react-flow__edge')).toHaveCount(3);
});

test('a reviewer reads a route without any edit controls', async ({ page }) => {
  await signIn(page, emailOf('reviewer'), DEMO_PASSWORD);
  // Earlier specs add routes to the demo team, so the demo route may sit past the first page: search for it.
  await page.getByRole('searchbox', { name: 'Search' }).fill('steam reforming');
  await expect(page.getByRole('link', { name: /steam reforming/ })).toBeVisible();
  await expect(page.getByRole('button', { name: 'New route' })).toHaveCount(0);
  await expect(page.getByRole('button', { name: /Duplicate/ })).toHaveCount(0);
  await expect(page.getByRole('button', { name: /Archive/ })).toHaveCount(0);

  await page.getByRole('link', { name: /steam reforming/ }).click();
  await expect(page.locator('.react-flow__node').first()).toBeVisible();
  await expect(page.getByText('read-only')).toBeVisible();
  await expect(page.getByRole('complementary', { name: 'Step palette' })).toHaveCount(0);
  await expect(page.getByRole('button', { name: 'Undo' })).toHaveCount(0);
  await expect(page.getByTestId('save-status')).toHaveCount(0);

  await page.locator('.react-flow__node').first().getByTestId('step-equation').click();
  await expect(page.getByRole('textbox', { name: 'Equation' })).toBeDisabled();
  await expect(page.getByRole('textbox', { name: /Temperature/ })).toBeDisabled();
  await expect(page.getByRole('button', { name: 'Remove step' })).toHaveCount(0);
  await expect(page.getByRole('button', { name: /Use this temperature/ })).toHaveCount(0);
  await expect(page.getByText('A thermodynamic screen only')).toBeVisible();
});
