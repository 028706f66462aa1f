// A designer builds a fine-chemical route from scratch without leaving the board: nitro reduction, then an amide
// formation, then a Boc protection, every species found by its name in the step's Add species search except the
// Boc carbamate, which no table has: its SMILES is pasted in the "new species from a structure" dialog over the board,
// saved as an estimate, and takes its place in the step that asked for it. The ladder then marks all three steps as
// resting on estimates.
//
// Chemistry (any organic chemistry text; common practice): 4-nitroaniline + 3 H2 → p-phenylenediamine + 2 H2O
// (catalytic hydrogenation of a nitroarene); p-phenylenediamine + acetic acid → 4'-aminoacetanilide + H2O (direct
// amidation); 4'-aminoacetanilide + di-tert-butyl dicarbonate → tert-butyl N-(4-acetamidophenyl)carbamate
// (CC(=O)Nc1ccc(NC(=O)OC(C)(C)C)cc1, C13H18N2O3; structure from memory) + tert-butanol + CO2. These are the demo
// route's three reactions (db/seeders/demo-estimated-routes.ts, "KR-117 building block"), which names the same
// species and binds only the carbamate to its SMILES: the aniline series is in the identifier table down to
// 4'-aminoacetanilide (CAS 122-80-5). The engine finds all three steps downhill at 298.15 K on its estimates
// (npm run -s thermo -- route); the figures themselves are not asserted here.
import { expect, test, type Page } from '@playwright/test';
import { DEMO_PASSWORD, DEMO_USERS } from '../../db/seeders/demo-team';
import { signIn } from './support/auth';

const designer = DEMO_USERS.find((u) => u.role === 'designer')!.email;
const PASTED = 'CC(=O)Nc1ccc(NC(=O)OC(C)(C)C)cc1';
const NEW_NAME = 'boc-aminoacetanilide';
const NEW_TERM = `${NEW_NAME}(l)`;

test.use({ viewport: { width: 1440, height: 1100 } });

type Phase = 'g' | 'l';

/** Types a name into "Add species", checks the first match is the compound meant, and adds it on one side in one phase. */
async function addByName(page: Page, text: string, side: 'Reactant' | 'Product', phase: Phase, expected: RegExp) {
  const box = page.getByTestId('add-species');
  await box.getByRole('radio', { name: side }).check();
  await box.getByLabel('Phase').selectOption(phase);
  const field = box.getByRole('combobox', { name: 'Add species' });
  await field.fill(text);
  // The settled answer for the whole text (an answer for part of it may show the same first match, then change).
  // The first search of a server process builds its index (seconds on a busy machine).
  const list = page.getByRole('listbox', { name: `Species matching ${text}`, exact: true });
  await expect(list).toBeVisible({ timeout: 30_000 });
  await expect(list).not.toHaveAttribute('aria-busy', 'true', { timeout: 30_000 });
  const first = list.getByRole('option').first();
  await expect(first).toHaveAccessibleName(expected, { timeout: 30_000 });
  await field.press('ArrowDown');
  await expect(first).toHaveAttribute('aria-selected', 'true');
  await field.press('Enter');
  await expect(field).toHaveValue('');
  await expect(box).toContainText(`Added ${text}`);
}

async function addBlankStep(page: Page, count: number) {
  await page.getByRole('button', { name: 'Add step: Blank step' }).click();
  await expect(page.locator('.react-flow__node')).toHaveCount(count);
  await expect(page.getByRole('complementary', { name: `Step ${count} details` })).toBeVisible();
}

test('a designer builds the fine-chemical route from scratch on the board, by names and one pasted new intermediate', async ({ page }) => {
  test.setTimeout(300_000);
  await signIn(page, designer, DEMO_PASSWORD);

  // The pasted intermediate is in no table: the engine can only estimate it, the identifier table has no name for it
  // (its name is the SMILES again), the team does not have it, and the search does not know its name.
  const probe = await page.request.post('/api/species/resolve', { data: { smiles: PASTED, phase: 'l' } });
  expect(probe.ok()).toBe(true);
  const known = (await probe.json()) as { origin: string; name: string; smiles: string; formula: string; inchikey: string; teamSpecies: unknown };
  expect(known).toMatchObject({ origin: 'estimated', formula: 'C13H18N2O3', teamSpecies: null });
  expect(known.name).toBe(known.smiles);
  const search = await page.request.get(`/api/species/search?${new URLSearchParams({ q: NEW_NAME })}`);
  expect(search.ok()).toBe(true);
  const hits = ((await search.json()) as { items: { inchikey: string | null }[] }).items;
  expect(hits.some((h) => h.inchikey === known.inchikey)).toBe(false);

  await page.getByRole('button', { name: 'New route' }).first().click();
  const create = page.getByRole('dialog', { name: 'New route' });
  await create.getByLabel('Name').fill(`Aminoacetanilide Boc route from scratch ${Date.now().toString(36)}`);
  await create.getByLabel('Target species').fill(NEW_TERM);
  await create.getByRole('button', { name: 'Create route' }).click();
  await expect(page).toHaveURL(/\/routes\/\d+$/);
  const routePath = new URL(page.url()).pathname;
  // Every navigation of the page from here on, same-document ones included: the build never leaves the board.
  const visited: string[] = [];
  page.on('framenavigated', (frame) => {
    if (frame === page.mainFrame()) visited.push(new URL(frame.url()).pathname);
  });
  const nodes = page.locator('.react-flow__node');

  // The flow opens over the board; Cancel by Escape changes nothing and gives the focus back to the link.
  const paletteLink = page.getByRole('complementary', { name: 'Step palette' }).getByRole('button', { name: 'New species from a structure' });
  await paletteLink.click();
  const flow = page.getByRole('dialog', { name: 'New species from a structure' });
  await expect(flow).toBeVisible();
  await expect(flow.getByRole('textbox', { name: 'SMILES' })).toBeFocused({ timeout: 15_000 });
  await page.keyboard.press('Escape');
  await expect(flow).toBeHidden();
  await expect(paletteLink).toBeFocused();
  await expect(nodes).toHaveCount(0);

  const equation = page.getByRole('textbox', { name: 'Equation' });

  // Step 1, nitro reduction: by names (the labels the search binds to each structure), then the coefficients typed.
  await addBlankStep(page, 1);
  await addByName(page, '4-nitroaniline', 'Reactant', 'l', /^4-nitroaniline, C6H6N2O2/);
  await addByName(page, 'hydrogen', 'Reactant', 'g', /^hydrogen, H2\b/);
  await addByName(page, 'p-phenylenediamine', 'Product', 'l', /^p-phenylenediamine, C6H8N2/);
  await addByName(page, 'water', 'Product', 'l', /^water, H2O/);
  await expect(page.getByTestId('balance-check').getByRole('button', { name: 'Balance' })).toBeVisible({ timeout: 30_000 });
  await equation.fill((await equation.inputValue()).replace(' + H2(g) ->', ' + 3 H2(g) ->').replace(/ \+ H2O\(l\)$/, ' + 2 H2O(l)'));
  await expect(equation).toHaveValue(/\+ 3 H2\(g\) -> p-phenylenediamine\(l\) \+ 2 H2O\(l\)$/);
  await expect(page.getByTestId('balance-check')).toContainText('Balanced.', { timeout: 30_000 });

  // Step 2, amide formation.
  await addBlankStep(page, 2);
  await addByName(page, 'p-phenylenediamine', 'Reactant', 'l', /^p-phenylenediamine, C6H8N2/);
  await addByName(page, 'acetic acid', 'Reactant', 'l', /^acetic acid, C2H4O2/);
  await addByName(page, "4'-aminoacetanilide", 'Product', 'l', /^4'-aminoacetanilide, C8H10N2O/);
  await addByName(page, 'water', 'Product', 'l', /^water, H2O/);
  await expect(page.getByTestId('balance-check')).toContainText('Balanced.', { timeout: 30_000 });

  // Step 3, Boc protection: the known species by name, and the new carbamate written by the name the chemist uses.
  await addBlankStep(page, 3);
  await addByName(page, "4'-aminoacetanilide", 'Reactant', 'l', /^4'-aminoacetanilide, C8H10N2O/);
  await addByName(page, 'di-tert-butyl dicarbonate', 'Reactant', 'l', /^di-tert-butyl dicarbonate, C10H18O5/);
  await addByName(page, 'tert-butanol', 'Product', 'l', /^tert-butanol, C4H10O/);
  await addByName(page, 'carbon dioxide', 'Product', 'g', /^carbon dioxide, CO2/);
  await equation.fill(`${await equation.inputValue()} + ${NEW_TERM}`);
  const panel = page.getByRole('complementary', { name: 'Step 3 details' });
  await expect(panel.getByTestId('step-result-error')).toContainText(NEW_NAME, { timeout: 30_000 });

  // "Not in the library" under the step's result opens the dialog over the board, carrying the name and phase written.
  await panel.getByTestId('step-result').getByRole('button', { name: 'Not in the library? New species from a structure' }).click();
  await expect(flow).toBeVisible();
  await expect(flow.getByLabel('Phase')).toHaveValue('l');
  await flow.getByRole('textbox', { name: 'SMILES' }).fill(PASTED);
  await flow.getByRole('button', { name: 'Show the estimate' }).click();
  const estimate = flow.getByTestId('structure-estimate');
  await expect(estimate).toBeVisible({ timeout: 30_000 });
  await expect(estimate).toContainText('C13H18N2O3');
  await expect(estimate.locator('[data-origin="estimated"]')).toContainText('Estimate');
  await expect(flow.getByTestId('estimate-groups')).toBeVisible();
  await expect(flow.getByLabel('Name', { exact: true })).toHaveValue(NEW_NAME);
  await expect(flow.getByRole('radio', { name: /Save the estimate/ })).toBeChecked();
  await flow.getByRole('button', { name: 'Save as a team species' }).click();

  // Saved, it takes the name's place in the step that asked, bound to its structure; the dialog closes and the focus
  // goes to that step's equation.
  await expect(flow).toBeHidden({ timeout: 30_000 });
  await expect(page.getByTestId('new-species-said')).toHaveText(`${NEW_NAME}, liquid, now named in Step 3 as ${NEW_TERM}.`);
  await expect(equation).toBeFocused();
  await expect(equation).toHaveValue(new RegExp(` \\+ CO2\\(g\\) \\+ ${NEW_NAME}\\(l\\)$`));
  await expect(panel.getByTestId('step-result-error')).toHaveCount(0, { timeout: 30_000 });
  await expect(panel.getByTestId('step-estimates')).toContainText(NEW_NAME, { timeout: 30_000 });
  await expect(page.getByTestId('balance-check')).toContainText('Balanced.', { timeout: 30_000 });

  // The board offers the two links where one step makes what the next needs.
  const suggestions = page.getByRole('region', { name: 'Suggested links' });
  await expect(suggestions).toContainText('from Step 1 to Step 2');
  await expect(suggestions).toContainText('from Step 2 to Step 3');
  await suggestions.getByRole('button', { name: 'Make these 2 links' }).click();
  await expect(page.locator('.react-flow__edge')).toHaveCount(2);

  // All three steps evaluate, each marked as resting on estimates, on its node and on the ladder.
  await expect(nodes).toHaveCount(3);
  await expect(page.getByTestId('step-estimate-mark')).toHaveCount(3, { timeout: 30_000 });
  await expect(page.getByTestId('ladder-estimate-mark')).toHaveCount(3, { timeout: 30_000 });

  await expect(page).toHaveURL(new RegExp(`${routePath}$`));
  expect(visited.every((path) => path === routePath), visited.join(' ')).toBe(true);

  // Autosaved: after a reload the three steps and their links are still there.
  await expect(page.getByTestId('save-status')).toHaveText('Saved', { timeout: 15_000 });
  await page.reload();
  await expect(nodes).toHaveCount(3);
  await expect(page.locator('.react-flow__edge')).toHaveCount(2);
});
