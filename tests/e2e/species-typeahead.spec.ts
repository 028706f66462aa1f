// The step editor's species search: type a name, pick a structure, see it drawn on the step node; a name that stands
// for two compounds offers both at the field. Chemistry: acetic acid + ethanol → ethyl acetate + water (Fischer
// esterification, any organic chemistry text); methyl crotonate has E and Z isomers under one name (PubChem).
import { expect, test, type Page } from '@playwright/test';
import { DEMO_PASSWORD, DEMO_USERS } from '../../db/seeders/demo-team';
import { signIn } from './support/auth';

const designer = DEMO_USERS.find((u) => u.role === 'designer')!.email;

test.use({ viewport: { width: 1440, height: 1100 } });

async function newRouteWithBlankStep(page: Page, name: string) {
  await signIn(page, designer, DEMO_PASSWORD);
  await page.getByRole('button', { name: 'New route' }).first().click();
  const dialog = page.getByRole('dialog', { name: 'New route' });
  await dialog.getByLabel('Name').fill(name);
  await dialog.getByLabel('Target species').fill('H2O(l)');
  await dialog.getByRole('button', { name: 'Create route' }).click();
  await expect(page).toHaveURL(/\/routes\/\d+$/);
  await page.getByRole('button', { name: 'Add step: Blank step' }).click();
  await expect(page.locator('.react-flow__node')).toHaveCount(1);
}

/** Types into "Add species" and picks the first match by keyboard, on the side asked for. */
async function addSpecies(page: Page, text: string, side: 'Reactant' | 'Product', expected: RegExp) {
  await page.getByTestId('add-species').getByRole('radio', { name: side }).check();
  const field = page.getByRole('combobox', { name: 'Add species' });
  await field.fill(text);
  // The answer for the whole text, settled: an earlier answer for part of it may show the same first match.
  const list = page.getByRole('listbox', { name: `Species matching ${text}`, exact: true });
  await expect(list).toBeVisible();
  await expect(list).not.toHaveAttribute('aria-busy', 'true');
  const options = list.getByRole('option');
  await expect(options.first()).toHaveAccessibleName(expected);
  await field.press('ArrowDown');
  await expect(options.first()).toHaveAttribute('aria-selected', 'true');
  await expect(field).toHaveAttribute('aria-activedescendant', (await options.first().getAttribute('id'))!);
  await field.press('Enter');
  await expect(field).toHaveValue('');
  await expect(field).toHaveAttribute('aria-expanded', 'false');
}

test('type a name, pick a structure, see it on the node', async ({ page }) => {
  await newRouteWithBlankStep(page, 'E2E esterification by name');
  const equation = page.getByRole('textbox', { name: 'Equation' });

  // Each match shows its drawing, named by name and formula; the exact name comes first.
  const field = page.getByRole('combobox', { name: 'Add species' });
  await field.fill('ethyl acetate');
  const first = page.getByRole('listbox', { name: /Species matching/ }).getByRole('option').first();
  // The first search of a server process builds its index (seconds on a busy machine).
  await expect(first).toHaveAccessibleName(/^ethyl acetate, C4H8O2/, { timeout: 30_000 });
  // An option's children are presentational to assistive technology, so the drawing is found by its alt text.
  await expect(first.locator('img[alt="ethyl acetate (C4H8O2)"]')).toBeVisible();
  await expect(first).toContainText('Library');
  await field.press('Escape');
  await expect(field).toHaveAttribute('aria-expanded', 'false');
  await field.press('Escape');
  await expect(field).toHaveValue('');

  await addSpecies(page, 'acetic acid', 'Reactant', /^acetic acid, C2H4O2/);
  await addSpecies(page, 'ethanol', 'Reactant', /^ethanol, C2H6O/);
  await addSpecies(page, 'ethyl acetate', 'Product', /^ethyl acetate, C4H8O2/);
  await addSpecies(page, 'water', 'Product', /^water, H2O/);

  // Library keys go in as written; ethyl acetate, known by structure, under a label bound to its SMILES.
  await expect(equation).toHaveValue(/->.*ethylacetate\(l\)/);
  await expect(page.getByTestId('add-species')).toContainText('Added water');
  await expect(page.getByTestId('balance-check')).toContainText('Balanced.');

  // The node draws the picked structure, named for the reader.
  const stepNode = page.locator('.react-flow__node').first();
  await expect(stepNode.getByRole('img', { name: /ethyl acetate/ }).first()).toBeVisible({ timeout: 15_000 });
});

test('a name that stands for two compounds offers both at the field', async ({ page }) => {
  await newRouteWithBlankStep(page, 'E2E ambiguous name');
  const equation = page.getByRole('textbox', { name: 'Equation' });
  await equation.fill('methyl crotonate(l) + H2(g) -> methyl butyrate(l)');

  const choices = page.getByRole('region', { name: 'Compounds called methyl crotonate' });
  await expect(choices).toBeVisible({ timeout: 30_000 });
  const buttons = choices.getByRole('button');
  await expect(buttons).toHaveCount(2);
  await expect(buttons.first().getByRole('img', { name: /methyl crotonate \(C5H8O2\)/ })).toBeVisible();
  await buttons.first().click();

  await expect(equation).toHaveValue(/^methylcrotonate\(l\) \+ H2\(g\) -> methyl butyrate\(l\)$/);
  await expect(choices).toHaveCount(0);
});

test('the search says when nothing matches', async ({ page }) => {
  await newRouteWithBlankStep(page, 'E2E search without matches');
  const field = page.getByRole('combobox', { name: 'Add species' });
  await field.fill('qqzzqqzzxx');
  await expect(page.getByTestId('species-search-popup')).toContainText('Nothing matches', { timeout: 30_000 });
  await expect(page.getByRole('status').filter({ hasText: 'Nothing matches' })).toHaveCount(1);
});
