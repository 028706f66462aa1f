// Issue 19, items 1–2: each step is evaluated from the moment it is added, and problems show at the field and node
// that caused them, in words. Library chemistry (NBS 1982): steam reforming is uphill at 298 K (ΔG° +142.1 kJ/mol).
import { expect, test, type Locator, type Page } from '@playwright/test';
import { DEMO_PASSWORD, DEMO_USERS } from '../../db/seeders/demo-team';
import { signIn } from './support/auth';

const designer = DEMO_USERS.find((u) => u.role === 'designer')!.email;

test.use({ viewport: { width: 1440, height: 1100 } });

async function newRoute(page: Page, name: string, target = 'CH3OH(g)') {
  await page.getByRole('button', { name: 'New route' }).first().click();
  const dialog = page.getByRole('dialog', { name: 'New route' });
  await dialog.getByLabel('Name').fill(name);
  await dialog.getByLabel('Target species').fill(target);
  await expect(dialog.getByLabel('Target species')).not.toHaveAttribute('aria-invalid', 'true');
  await dialog.getByRole('button', { name: 'Create route' }).click();
  await expect(page).toHaveURL(/\/routes\/\d+$/);
}

/** Adds a step from the palette with the keyboard's "Add" button; the new step is selected. */
async function addStep(page: Page, name: RegExp): Promise<Locator> {
  const nodes = page.locator('.react-flow__node');
  const before = await nodes.count();
  await page.getByRole('complementary', { name: 'Step palette' }).getByRole('button', { name }).first().click();
  await expect(nodes).toHaveCount(before + 1);
  return nodes.last();
}

const equationField = (page: Page) => page.getByRole('textbox', { name: 'Equation' });

test('a new route’s first step shows its ΔG and class before any link, and the totals say why they wait', async ({ page }) => {
  await signIn(page, designer, DEMO_PASSWORD);
  await newRoute(page, 'E2E first step alone');
  const step = await addStep(page, /^Add step: Steam reforming of methane/);

  await expect(step.getByText('uphill')).toBeVisible();
  await expect(step).toContainText(/ΔG°? \+142\.1/);
  await expect(step).not.toContainText('not evaluated');
  await expect(page.getByTestId('step-result')).toContainText('Uphill');
  await expect(page.getByTestId('ladder-totals-withheld')).toContainText('Route totals wait for a complete route');
  await expect(page.getByTestId('ladder-totals-withheld')).toContainText('CH3OH(g)');
  await expect(page.getByText(/could not be evaluated/)).toHaveCount(0);
});

test('a misspelt species is said at the equation field and on the node, never “Balanced” or a request path', async ({ page }) => {
  await signIn(page, designer, DEMO_PASSWORD);
  await newRoute(page, 'E2E misspelt species');
  const step = await addStep(page, /^Add step: Blank step/);

  await equationField(page).fill('CO(g) + 2 H2(g) -> CH3OHH(g)');
  await expect(equationField(page)).toHaveAttribute('aria-invalid', 'true');
  // Read as one retried check: the field's note is the message, whichever answer (balance or evaluation) set it.
  await expect(equationField(page)).toHaveAttribute('aria-describedby', /-equation-error$/);
  await expect(page.locator('[id$="-equation-error"]')).toContainText('Not in the species library: CH3OHH(g)');
  await expect(page.getByTestId('balance-check')).not.toContainText('✓');
  await expect(page.getByTestId('balance-check')).toContainText('CH3OHH(g) is not in the species library');

  await expect(step.getByTestId('step-node-problem-label')).toHaveText(/unknown species/);
  await expect(step.getByTestId('step-node-problem')).toContainText('CH3OHH(g)');
  await expect(page.getByText(/steps\.\d+\./)).toHaveCount(0);

  // Fixed: the node shows its class again, never the old problem.
  await equationField(page).fill('CO(g) + 2 H2(g) -> CH3OH(g)');
  await expect(step.getByTestId('step-node-problem')).toHaveCount(0);
  await expect(step.getByText(/downhill|marginal|uphill/).first()).toBeVisible();
  await expect(equationField(page)).not.toHaveAttribute('aria-invalid', 'true');
});

test('an edited step is marked stale until its new answer, never showing its old ΔG as current', async ({ page }) => {
  await signIn(page, designer, DEMO_PASSWORD);
  await newRoute(page, 'E2E stale node');
  const step = await addStep(page, /^Add step: Steam reforming of methane/);
  await expect(step.getByText('uphill')).toBeVisible();

  // While the edit is unevaluated the node says so; then the answer for the unparsable equation names its cause.
  await equationField(page).fill('CH4(g) + H2O(g) -> -> CO(g)');
  await expect(step.getByText('uphill')).toHaveCount(0);
  await expect(step.getByTestId('step-node-problem-label')).toHaveText(/check equation/);
  await expect(step).not.toContainText('+142.1');
});

test('pressures typed with their own unit are kept and converted; text that is no pressure is refused at the field', async ({ page }) => {
  await signIn(page, designer, DEMO_PASSWORD);
  await newRoute(page, 'E2E pressure units');
  await addStep(page, /^Add step: Blank step/);
  await equationField(page).fill('CO(g) + 2 H2(g) -> CH3OH(g)');

  const pCO = page.getByLabel('p CO(g)');
  await pCO.fill('50 atm');
  await expect(pCO).not.toHaveAttribute('aria-invalid', 'true');
  await expect(page.getByText('Read as 50 atm = 50.66 bar.')).toBeVisible();
  await expect(page.getByTestId('step-result')).toContainText('ΔG at conditions');

  await pCO.fill('lots');
  await expect(pCO).toHaveAttribute('aria-invalid', 'true');
  await expect(page.getByText(/bar, atm, kPa, Pa, MPa, psi, mmHg or torr/)).toBeVisible();
});

test('a temperature outside the species’ data is said at the temperature field with the ranges, not as an equation problem', async ({ page }) => {
  await signIn(page, designer, DEMO_PASSWORD);
  await newRoute(page, 'E2E temperature range');
  const step = await addStep(page, /^Add step: Blank step/);
  await equationField(page).fill('CO(g) + 2 H2(g) -> CH3OH(g)');
  const temperature = page.getByRole('textbox', { name: /Temperature/ });

  await temperature.fill('100');
  await expect(page.getByTestId('temperature-range-note')).toContainText(/100 K is outside the data of .*CH3OH\(g\) \(200–6000 K\)/);

  await temperature.fill('hot');
  await expect(temperature).toHaveAttribute('aria-invalid', 'true');
  await expect(step).not.toContainText('check equation');
});

test('the new-route dialog refuses an unknown target and an amount of “lots” as they are typed', async ({ page }) => {
  await signIn(page, designer, DEMO_PASSWORD);
  await page.getByRole('button', { name: 'New route' }).first().click();
  const dialog = page.getByRole('dialog', { name: 'New route' });
  await dialog.getByLabel('Name').fill('E2E bad input');

  const target = dialog.getByLabel('Target species');
  await target.fill('Unobtainium');
  await expect(target).toHaveAttribute('aria-invalid', 'true');
  await expect(dialog.getByText(/Unobtainium cannot be read as a species/)).toBeVisible();

  const amount = dialog.getByLabel('Target amount');
  await amount.fill('lots');
  await expect(amount).toHaveAttribute('aria-invalid', 'true');
  await expect(dialog.getByText(/Write an amount of substance/)).toBeVisible();

  // Nothing is created while the fields are refused; corrected, the route is made.
  await dialog.getByRole('button', { name: 'Create route' }).click();
  await expect(page).toHaveURL(/\/routes$/);
  await target.fill('CH3OH(g)');
  await amount.fill('2 mol');
  await expect(target).not.toHaveAttribute('aria-invalid', 'true');
  await expect(amount).not.toHaveAttribute('aria-invalid', 'true');
  await dialog.getByRole('button', { name: 'Create route' }).click();
  await expect(page).toHaveURL(/\/routes\/\d+$/);
});

test('when the totals wait because of the target or its amount, route settings say so at that field', async ({ page }) => {
  await signIn(page, designer, DEMO_PASSWORD);
  await newRoute(page, 'E2E target field');
  await addStep(page, /^Add step: Steam reforming of methane/);
  await page.getByRole('button', { name: 'Route settings' }).click();
  const settings = page.getByRole('form', { name: 'Route settings' });

  // An amount the engine cannot read: marked at the amount field, in words, as well as on the ladder.
  const amount = settings.getByLabel('Target amount');
  await amount.fill('lots');
  await expect(amount).toHaveAttribute('aria-invalid', 'true');
  const amountNote = page.locator(`[id="${(await amount.getAttribute('aria-describedby'))!}"]`);
  await expect(amountNote).toContainText(/cannot read "lots" as an amount/i);
  await expect(amountNote).toContainText('The route totals wait until this is fixed.');
  await expect(page.getByTestId('ladder-totals-withheld')).toContainText('Target amount');
  await amount.fill('2 mol');
  await expect(amount).not.toHaveAttribute('aria-invalid', 'true');

  // A target the engine cannot read as a species: marked at the target field.
  const target = settings.getByLabel('Target species');
  await target.fill('Unobtainium(g)');
  await expect(target).toHaveAttribute('aria-invalid', 'true');
  await expect(page.locator(`[id="${(await target.getAttribute('aria-describedby'))!}"]`)).toContainText('Unobtainium');
  // A target no step makes yet is a route still being built: said on the ladder, the field stays unmarked.
  await target.fill('CH3OH(g)');
  await expect(target).not.toHaveAttribute('aria-invalid', 'true');
  await expect(page.getByTestId('ladder-totals-withheld')).toContainText('No step makes the target');
});
