import { expect, test } from '@playwright/test';
import { invitationLinkFor } from './support/mail';

test('a new lead signs up, invites a reviewer by e-mail, and the reviewer joins without edit controls', async ({ page, browser }) => {
  const stamp = Date.now();
  const leadEmail = `wren.castellano+${stamp}@pilot-plant.example`;
  const reviewerEmail = `isidro.kahale+${stamp}@pilot-plant.example`;

  await page.goto('/sign-up');
  await page.getByLabel('Your name').fill('Wren Castellano');
  await page.getByLabel('E-mail').fill(leadEmail);
  await page.getByLabel('Password').fill('short');
  await page.getByLabel('Team name').fill('Pilot Plant Group');
  await page.getByRole('button', { name: 'Create account and team' }).click();
  await expect(page.getByText('Use at least 10 characters.')).toBeVisible();
  await page.getByLabel('Password').fill('a-long-enough-password');
  await page.getByRole('button', { name: 'Create account and team' }).click();
  await expect(page).toHaveURL(/\/routes$/);
  await expect(page.getByRole('combobox', { name: 'Team' })).toHaveValue(/\d+/);

  await page.getByRole('link', { name: 'Team' }).click();
  await page.getByLabel('E-mail').fill(reviewerEmail);
  await page.getByLabel('Role', { exact: true }).selectOption('reviewer');
  await page.getByRole('button', { name: 'Send invitation' }).click();
  await expect(page.getByText(`Invitation sent to ${reviewerEmail}.`)).toBeVisible();

  const link = await invitationLinkFor(reviewerEmail);
  const reviewerContext = await browser.newContext();
  const reviewer = await reviewerContext.newPage();
  await reviewer.goto(link);
  await expect(reviewer.getByRole('heading', { name: 'Join Pilot Plant Group' })).toBeVisible();
  await reviewer.getByLabel('Your name').fill('Isidro Kahale');
  await reviewer.getByLabel('Choose a password').fill('reviewer-password-1');
  await reviewer.getByRole('button', { name: 'Create account and join' }).click();
  await expect(reviewer).toHaveURL(/\/routes$/);

  await reviewer.getByRole('link', { name: 'Team' }).click();
  await expect(reviewer.getByRole('cell', { name: 'Wren Castellano' })).toBeVisible();
  await expect(reviewer.getByRole('button', { name: 'Send invitation' })).toHaveCount(0);
  await expect(reviewer.getByRole('button', { name: 'Remove' })).toHaveCount(0);
  await expect(reviewer.getByRole('combobox', { name: /Role of/ })).toHaveCount(0);

  // The server refuses too, not only the screen.
  const teamId = await reviewer.getByRole('combobox', { name: 'Team' }).inputValue();
  const attempt = await reviewer.request.post(`/api/teams/${teamId}/invitations`, { data: { email: 'x@example.test', role: 'lead' } });
  expect(attempt.status()).toBe(403);

  await reviewer.goto(link);
  await expect(reviewer.getByRole('heading', { name: 'Invitation already used' })).toBeVisible();
  await reviewerContext.close();
});
