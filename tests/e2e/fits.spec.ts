import fs from 'node:fs';
import { expect, test } from '@playwright/test';
import { DEMO_PASSWORD, DEMO_USERS } from '../../db/seeders/demo-team';
import { signIn } from './support/auth';

const designer = DEMO_USERS.find((u) => u.role === 'designer')!.email;
const R = 8.314462618;

// Invented measurements for the e2e only (not a reference check): K(T) of the dimer split made from
// ΔH° = 57.2 kJ/mol and ΔS° = 175.8 J/(mol K) with a little scatter.
function csv(): string {
  const rows = [300, 320, 340, 360, 380].map((T, i) => {
    const K = Math.exp(-57_200 / (R * T) + 175.8 / R) * (1 + (i % 2 ? 0.01 : -0.01));
    return `${T},${K.toPrecision(5)}`;
  });
  return ['T,K', ...rows].join('\n');
}

test.use({ viewport: { width: 1440, height: 1100 } });

test('a designer fits K(T), makes a team species from the fit, and a route step uses the fit by name', async ({ page }) => {
  await signIn(page, designer, DEMO_PASSWORD);
  const stamp = Date.now();
  const file = test.info().outputPath('dimer.csv');
  fs.writeFileSync(file, csv());

  await page.goto('/fits');
  await page.getByRole('button', { name: 'New data set' }).click();
  const form = page.getByRole('form', { name: 'New data set' });
  await form.getByLabel('Name').fill(`E2E dimer split ${stamp}`);
  await form.getByLabel('Reaction (optional)').fill('N2O4(g) -> 2 NO2(g)');
  await form.getByLabel('Upload CSV').check();
  await form.getByLabel(/CSV file/).setInputFiles(file);
  await form.getByRole('button', { name: 'Save data set' }).click();

  const set = page.getByRole('region', { name: `Data set E2E dimer split ${stamp}` });
  await expect(set.getByRole('img').first()).toBeVisible();
  await expect(set).toContainText(/ΔH°\s*5\d\.\d* ± /);

  await set.getByLabel('Save this fit as').fill(`E2E dimer fit ${stamp}`);
  await set.getByRole('button', { name: 'Save fit with its raw data' }).click();
  await expect(set.getByText(/Saved as fit #\d+/)).toBeVisible();
  const fitId = Number((await set.getByText(/Saved as fit #\d+/).innerText()).match(/#(\d+)/)![1]);

  const species = page.getByRole('form', { name: 'Create team species from this fit' });
  await species.getByLabel('Species to solve for').fill('N2O4(g)');
  await species.getByLabel('Name').fill(`Dinitrogen tetroxide (fit ${stamp})`);
  await species.getByRole('button', { name: 'Create team species' }).click();
  await expect(species).toContainText('added to your team’s species');

  // A route whose step takes ΔH° and ΔS° from the fit.
  const created = await page.request.post('/api/routes', { data: { name: `E2E fitted step ${stamp}`, target: 'NO2(g)', targetAmount: '1 mol' } });
  const { id, version } = (await created.json()) as { id: number; version: number };
  const step = { id: 's1', equation: 'N2O4(g) -> 2 NO2(g)', temperature: '350 K', yieldPct: 100, notes: '', position: { x: 0, y: 0 } };
  expect((await page.request.put(`/api/routes/${id}`, { data: { version, name: `E2E fitted step ${stamp}`, target: 'NO2(g)', targetAmount: '1 mol', marginalThreshold_kJ: -17, steps: [step], links: [] } })).status()).toBe(200);
  await page.goto(`/routes/${id}`);
  await page.locator('.react-flow__node[data-id="s1"] [data-testid="step-equation"]').click();
  await page.getByLabel('ΔH° and ΔS° from').selectOption(String(fitId));
  await expect(page.getByTestId('step-data-source')).toContainText(`E2E dimer fit ${stamp}`, { timeout: 10_000 });
  await expect(page.getByText('Saved', { exact: true })).toBeVisible({ timeout: 10_000 });
  await page.reload();
  await page.locator('.react-flow__node[data-id="s1"] [data-testid="step-equation"]').click();
  await expect(page.getByTestId('step-data-source')).toContainText(`E2E dimer fit ${stamp}`);

  // The team species made from the fit: a step on library data now uses it, and says the fit is its source.
  await page.getByLabel('ΔH° and ΔS° from').selectOption('');
  await expect(page.getByTestId('step-data-source')).toContainText('team species N2O4(g)', { timeout: 10_000 });
  await expect(page.getByTestId('step-data-source')).toContainText(`E2E dimer fit ${stamp}`);
});
