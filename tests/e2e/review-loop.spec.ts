// The review loop's small things: what the lead sees before approving, the comment box's counter and @ completion,
// the caution that folds to one line (and stays whole on paper), the 404 inside the shell and the favicon.
import { expect, test, type Page } from '@playwright/test';
import { DEMO_PASSWORD } from '../../db/seeders/demo-team';
import { signIn } from './support/auth';
import { demoUser, makeReviewRoute } from './support/review-route';

const user = demoUser;

test.use({ viewport: { width: 1440, height: 1100 } });

const makeRoute = makeReviewRoute;

const review = (page: Page) => page.getByRole('region', { name: 'Review' });
const composer = (page: Page) => review(page).getByRole('combobox', { name: 'Comment on the whole route' });

test('the approve dialog names the open safety flag and the unresolved thread by step, never by id, before the lead confirms', async ({ page }) => {
  await signIn(page, user('lead').email, DEMO_PASSWORD);
  const routeId = await makeRoute(page.request, `E2E approve check ${Date.now()}`);
  const flag = await page.request.post(`/api/routes/${routeId}/flags`, { data: { stepKey: 's2', category: 'safety', reason: 'Methanol loop at 500 K: relief sizing not yet reviewed.' } });
  expect(flag.status()).toBe(201);
  const comment = await page.request.post(`/api/routes/${routeId}/comments`, { data: { body: 'Is the steam-to-carbon ratio written down anywhere?', stepKey: 's1' } });
  expect(comment.status()).toBe(201);

  await page.goto(`/routes/${routeId}`);
  await expect(page.getByText('Saved', { exact: true })).toBeVisible();
  await page.getByRole('button', { name: 'Send for review' }).click();
  const send = page.getByRole('dialog', { name: 'Send for review' });
  await send.getByLabel(new RegExp(user('reviewer').name)).check();
  await send.getByRole('button', { name: 'Send for review' }).click();
  await expect(page.getByTestId('status-badge')).toHaveText(/In review/);

  await page.getByRole('button', { name: 'Approve', exact: true }).click();
  const dialog = page.getByRole('dialog', { name: 'Approve this route' });
  const check = dialog.getByTestId('approval-check');
  await expect(check).toContainText('1 open flag, 1 of them on safety');
  // Full labels, as on the board's panels: the number and what the step does.
  await expect(check).toContainText(/Safety · Step 2 \(methanol from carbon monoxide\).*relief sizing not yet reviewed/);
  await expect(check).toContainText('1 unresolved comment thread');
  await expect(check).toContainText(/Step 1 \(steam reforming of methane\).*steam-to-carbon ratio/);
  expect(await check.innerText()).not.toMatch(/\bs[12]\b|s-[0-9a-f]{8}/);
  // The lead can still approve, knowingly: the button says so. Here they step back instead.
  await expect(dialog.getByRole('button', { name: 'Approve with these open' })).toBeVisible();
  await dialog.getByRole('button', { name: 'Cancel' }).click();
  await expect(page.getByTestId('status-badge')).toHaveText(/In review/);
});

test('the comment box counts characters and refuses more than the limit instead of cutting; @ completes a colleague’s name', async ({ page }) => {
  await signIn(page, user('designer').email, DEMO_PASSWORD);
  const routeId = await makeRoute(page.request, `E2E comment box ${Date.now()}`);
  await page.goto(`/routes/${routeId}`);
  await expect(page.getByText('Saved', { exact: true })).toBeVisible();

  const box = composer(page);
  const count = review(page).getByTestId('comment-count');
  await expect(count).toHaveText('0 / 10,000');
  await box.fill('x'.repeat(10_001));
  await expect(count).toContainText('10,001 / 10,000 (1 too many)');
  await review(page).getByRole('button', { name: 'Comment', exact: true }).click();
  await expect(review(page).getByText('A comment is at most 10,000 characters.')).toBeVisible();
  // Nothing was cut and nothing was posted.
  expect(await box.inputValue()).toHaveLength(10_001);
  await expect(review(page).getByTestId('comment')).toHaveCount(0);

  // "@ott" offers Ottilie Marchetti (handle "lead"); the keyboard picks her, and the server reads the mention.
  await box.fill('');
  await box.pressSequentially('Please check the reformer, @ott');
  const options = review(page).getByRole('listbox', { name: 'Mention a colleague' });
  await expect(options.getByRole('option', { name: /Ottilie Marchetti/ })).toBeVisible();
  await expect(box).toHaveAttribute('aria-expanded', 'true');
  await box.press('Enter');
  await expect(options).toBeHidden();
  await expect(box).toHaveValue('Please check the reformer, @lead ');

  // A bare "@" lists the team; arrows move the choice.
  await box.pressSequentially('and @');
  await expect(options.getByRole('option')).not.toHaveCount(0);
  const first = await options.getByRole('option', { selected: true }).innerText();
  await box.press('ArrowDown');
  await expect(options.getByRole('option', { selected: true })).not.toHaveText(first);
  await box.press('Escape');
  await expect(options).toBeHidden();
  await box.press('Backspace');

  await review(page).getByRole('button', { name: 'Comment', exact: true }).click();
  const posted = review(page).getByTestId('comment').first();
  await expect(posted.locator('.mention')).toHaveText('@Ottilie Marchetti');
  await expect(count).toHaveText('0 / 10,000');
});

test('the safety caution folds to one line once read, stays folded after a reload, and the printed comparison keeps it whole', async ({ page }) => {
  await signIn(page, user('reviewer').email, DEMO_PASSWORD);
  // The reviewer cannot create routes; the designer's demo routes are readable to the whole team.
  const list = await page.request.get('/api/routes?pageSize=2');
  expect(list.status()).toBe(200);
  const ids = ((await list.json()) as { items: Array<{ id: number }> }).items.map((r) => r.id);
  expect(ids.length).toBe(2);
  try {
    await page.goto(`/routes/${ids[0]}`);
    const caution = page.getByTestId('safety-caution');
    await expect(caution).toHaveAttribute('data-folded', 'false');
    await expect(caution.getByText('A thermodynamic screen only', { exact: true })).toBeVisible();
    await caution.getByRole('button', { name: 'I have read this: fold it to one line' }).click();
    await expect(caution).toHaveAttribute('data-folded', 'true');
    await expect(caution).toContainText('Thermodynamic screen only: it says nothing of rates, runaway');
    expect((await caution.boundingBox())!.height).toBeLessThan(40);

    // Remembered on the server, so a reload (or another device) keeps it folded.
    await page.reload();
    await expect(page.getByTestId('safety-caution')).toHaveAttribute('data-folded', 'true');
    await expect(page.getByTestId('safety-caution').getByText('A thermodynamic screen only', { exact: true })).toHaveCount(0);

    // Paper travels to people who have not read it: the printable comparison keeps the whole caution.
    await page.goto(`/routes/compare/report?ids=${ids.join(',')}&basis=conditions`);
    await expect(page.getByTestId('safety-caution')).toHaveAttribute('data-folded', 'false');
    await expect(page.getByTestId('safety-caution').getByText('A thermodynamic screen only', { exact: true })).toBeVisible();

    // And it opens again on request.
    await page.goto(`/routes/${ids[0]}`);
    await page.getByTestId('safety-caution').getByRole('button', { name: 'Show in full' }).click();
    await expect(page.getByTestId('safety-caution')).toHaveAttribute('data-folded', 'false');
  } finally {
    // Other specs read the full caution as this person.
    await page.request.patch('/api/me/preferences', { data: { cautionCollapsed: false } });
  }
});

test('a route that does not exist answers inside the app shell with a way back; the tab has our icon', async ({ page }) => {
  await signIn(page, user('designer').email, DEMO_PASSWORD);
  await page.goto('/routes/999999999');
  await expect(page.getByRole('navigation', { name: 'Main' })).toBeVisible();
  await expect(page.getByRole('heading', { name: 'There is no such route here' })).toBeVisible();
  await page.getByTestId('in-app-not-found').getByRole('link', { name: 'All routes' }).click();
  await expect(page).toHaveURL(/\/routes$/);

  await page.goto('/no-such-section');
  await expect(page.getByRole('navigation', { name: 'Main' })).toBeVisible();
  await expect(page.getByRole('heading', { name: 'There is no such page here' })).toBeVisible();

  const href = await page.locator('link[rel="icon"]').first().getAttribute('href');
  expect(href).toMatch(/^\/icon\.svg/);
  const icon = await page.request.get(href!);
  expect(icon.status()).toBe(200);
  expect(icon.headers()['content-type']).toMatch(/image\/svg\+xml/);
});
