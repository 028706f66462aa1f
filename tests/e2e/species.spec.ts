import fs from 'node:fs';
import { expect, test } from '@playwright/test';
import { DEMO_PASSWORD, DEMO_USERS } from '../../db/seeders/demo-team';
import { signIn } from './support/auth';

const designer = DEMO_USERS.find((u) => u.role === 'designer')!.email;
const HEADER = 'formula,phase,name,dfH (kJ/mol),dfG (kJ/mol),S (J/(mol K)),provenance,reference';

test.use({ viewport: { width: 1440, height: 1000 } });

test('the library finds a built-in species and plots it over its data range', async ({ page }) => {
  await signIn(page, designer, DEMO_PASSWORD);
  await page.goto('/species');
  await page.getByPlaceholder(/Formula, name or alias/).fill('methanol');
  const row = page.getByRole('row').filter({ hasText: 'CH3OH' }).first();
  await expect(row).toBeVisible();
  await row.getByRole('link').first().click();
  await expect(page).toHaveURL(/\/species\//);
  await expect(page.getByRole('heading', { name: /Over the data range/ })).toBeVisible();
  await expect(page.locator('svg').first()).toBeVisible();
});

test('a CSV with one bad row imports nothing; the corrected file adds the team species', async ({ page }) => {
  await signIn(page, designer, DEMO_PASSWORD);
  const n = 60 + (Date.now() % 30);
  const good = `C${n}H${2 * n + 2},g,Kestrel wax cut ${n},-900,,1800,estimated,Benson groups (notebook KR-12)`;
  const bad = `C${n + 1}H${2 * n + 4},g,Kestrel wax cut ${n + 1},not-a-number,,1810,estimated,Benson groups (notebook KR-12)`;
  const badFile = test.info().outputPath('bad.csv');
  const goodFile = test.info().outputPath('good.csv');
  fs.writeFileSync(badFile, `${HEADER}\n${good}\n${bad}\n`);
  fs.writeFileSync(goodFile, `${HEADER}\n${good}\n`);

  await page.goto('/species/import');
  await page.getByLabel('CSV file').setInputFiles(badFile);
  await expect(page.getByRole('heading', { name: /bad\.csv: 2 rows/ })).toBeVisible();
  await expect(page.getByRole('button', { name: /Import 2 rows/ })).toBeDisabled();

  await page.getByLabel('CSV file').setInputFiles(goodFile);
  await expect(page.getByRole('heading', { name: /good\.csv: 1 rows?/ })).toBeVisible();
  await page.getByRole('button', { name: /Import 1 rows?/ }).click();
  await expect(page.getByText(/1 added, 0 overridden, 0 skipped/).first()).toBeVisible();

  await page.goto('/species');
  await page.getByPlaceholder(/Formula, name or alias/).fill(`Kestrel wax cut ${n}`);
  await expect(page.getByRole('row').filter({ hasText: `Kestrel wax cut ${n}` })).toContainText(/team/i);
});
