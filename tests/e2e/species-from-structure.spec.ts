// New species from a structure, over the board: a designer pastes the SMILES of a Boc-protected
// aminoalcohol that no table has (tert-butyl N-(1-hydroxy-2-methylpropan-2-yl)carbamate, checked absent first), sees
// its estimate and the groups it matched, saves it for the team, writes it into a Boc protection step by name, and
// finds the estimate marked on the node, the ladder and in the CSV export.
// Chemistry: amine + di-tert-butyl dicarbonate → Boc carbamate + tert-butanol + CO2 (the usual Boc protection, any
// organic chemistry text; common practice). Values are the engine's group-additivity estimates, not measurements.
import fs from 'node:fs';
import { expect, test } from '@playwright/test';
import { DEMO_PASSWORD, DEMO_USERS } from '../../db/seeders/demo-team';
import { signIn } from './support/auth';

const designer = DEMO_USERS.find((u) => u.role === 'designer')!.email;
const SMILES = 'CC(C)(C)OC(=O)NC(C)(C)CO';
const NAME = 'tert-butyl 1-hydroxy-2-methylpropan-2-ylcarbamate';
const STEP = `2-amino-2-methyl-1-propanol(l) + di-tert-butyl dicarbonate(l) -> ${NAME}(l) + tert-butanol(l) + CO2(g)`;

test.use({ viewport: { width: 1440, height: 1100 } });

test('create a species from a SMILES no table has, see its estimate and groups, save it, use it in a step, and see the estimate mark on the ladder and in the CSV', async ({ page }) => {
  await signIn(page, designer, DEMO_PASSWORD);

  // Absent everywhere: neither the library, nor the identifier table (its name would be the SMILES), nor the team.
  const probe = await page.request.post('/api/species/resolve', { data: { smiles: SMILES, phase: 'l' } });
  expect(probe.ok()).toBe(true);
  const known = (await probe.json()) as { origin: string; name: string; smiles: string; teamSpecies: unknown };
  expect(known).toMatchObject({ origin: 'estimated', teamSpecies: null });
  expect(known.name).toBe(known.smiles);

  await page.getByRole('button', { name: 'New route' }).first().click();
  const dialog = page.getByRole('dialog', { name: 'New route' });
  await dialog.getByLabel('Name').fill('E2E Boc protection of a new aminoalcohol');
  await dialog.getByLabel('Target species').fill('CO2(g)');
  await dialog.getByRole('button', { name: 'Create route' }).click();
  await expect(page).toHaveURL(/\/routes\/\d+$/);
  const routeUrl = new URL(page.url()).pathname;

  // From the palette, the flow opens in a dialog over the board: the board stays where it is.
  await page.getByRole('complementary', { name: 'Step palette' }).getByRole('button', { name: 'New species from a structure' }).click();
  const flow = page.getByRole('dialog', { name: 'New species from a structure' });
  await expect(flow).toBeVisible();
  expect(new URL(page.url()).pathname).toBe(routeUrl);

  // A broken SMILES is refused at the field, with where it breaks.
  const smilesField = flow.getByRole('textbox', { name: 'SMILES' });
  await smilesField.fill('CC(C)(C)OC(=O)NC(C(C)CO');
  await flow.getByRole('button', { name: 'Show the estimate' }).click();
  await expect(flow.getByText(/Cannot read the SMILES/)).toBeVisible({ timeout: 30_000 });

  await smilesField.fill(SMILES);
  await expect(flow.getByLabel('Phase')).toHaveValue('l');
  await flow.getByRole('button', { name: 'Show the estimate' }).click();
  const estimate = flow.getByTestId('structure-estimate');
  await expect(estimate).toBeVisible({ timeout: 30_000 });
  await expect(estimate.locator('img[src^="/api/structures/svg"]')).toHaveAttribute('alt', /C9H19NO3/);
  await expect(estimate).toContainText('C9H19NO3');
  await expect(estimate.locator('[data-origin="estimated"]')).toContainText('Estimate');
  for (const term of ['ΔfH°', 'S°', 'ΔfG°', 'Cp°']) await expect(estimate.getByText(term, { exact: false }).first()).toBeVisible();
  await expect(estimate).toContainText(/group additivity/i);
  const groups = flow.getByTestId('estimate-groups');
  await expect(groups).toBeVisible();
  expect(await groups.locator('tbody tr').count()).toBeGreaterThan(3);
  await expect(groups).toContainText('Benson');

  // Saved as the estimate: provenance "estimated", method and σ recorded. No step is selected, so there is
  // nothing to add it to yet: the dialog says how to find it, and closes.
  await flow.getByLabel('Name', { exact: true }).fill(NAME);
  await expect(flow.getByRole('radio', { name: /Save the estimate/ })).toBeChecked();
  await flow.getByRole('button', { name: 'Save as a team species' }).click();
  await expect(flow.getByText(`“${NAME}” is now one of your team’s species`)).toBeVisible({ timeout: 30_000 });
  await expect(flow.getByText(/Provenance: estimated/)).toBeVisible();
  await flow.getByRole('button', { name: 'Close' }).click();
  await expect(flow).toBeHidden();
  expect(new URL(page.url()).pathname).toBe(routeUrl);

  // Used in a step by its name; the node and the ladder mark the estimate.
  await page.getByRole('button', { name: 'Add step: Blank step' }).click();
  await expect(page.locator('.react-flow__node')).toHaveCount(1);
  await page.getByRole('textbox', { name: 'Equation' }).fill(STEP);
  await expect(page.getByTestId('step-estimate-mark').first()).toBeVisible({ timeout: 30_000 });
  await expect(page.getByTestId('ladder-estimate-mark').first()).toBeVisible();

  const download = page.waitForEvent('download');
  await page.getByRole('button', { name: 'Export CSV' }).click();
  const csv = fs.readFileSync((await (await download).path())!, 'utf8');
  const [header, ...rows] = csv.replace(/^\uFEFF/, '').trim().split(/\r?\n/).map(cells);
  const column = (name: string) => header!.indexOf(name);
  expect(column('estimated_species')).toBeGreaterThanOrEqual(0);
  const row = rows.find((r) => r[column('estimated_species')]?.includes(NAME));
  expect(row, csv).toBeDefined();
  expect(['estimated', 'mixed']).toContain(row![column('data_origin')]);
  expect(row![column('estimation_method')]).toMatch(/group additivity/i);

  // The species section's page runs the same flow: the structure is the team's now, and is pointed at, not copied.
  await page.goto(`/species/from-structure?smiles=${encodeURIComponent(SMILES)}&phase=l&return=${encodeURIComponent(routeUrl)}`);
  await expect(page.getByRole('heading', { name: 'New species from a structure' })).toBeVisible();
  await expect(page.getByText(`Your team already has this structure: “${NAME}”`)).toBeVisible({ timeout: 30_000 });
});

/** One CSV line's cells (quoted cells may hold commas and doubled quotes). */
function cells(line: string): string[] {
  return [...line.matchAll(/("(?:[^"]|"")*"|[^,]*)(?:,|$)/g)].map((m) => m[1]!.replace(/^"|"$/g, '').replace(/""/g, '"')).slice(0, -1);
}
