import { expect, test, type Browser, type Page } from '@playwright/test';
import { DEMO_PASSWORD } from '../../db/seeders/demo-team';
import { readMailbox } from '../../lib/mail/mailbox';
import { signIn } from './support/auth';
import { demoUser, makeReviewRoute } from './support/review-route';
import { E2E_MAIL_DIR } from './support/e2e-env';

const user = demoUser;
const XSS = '<img src=x onerror="window.__xss=1"><script>window.__xss=2</script> Watch the **water** removal, @designer';

test.use({ viewport: { width: 1440, height: 1100 } });

const makeRoute = makeReviewRoute;

async function pageAs(browser: Browser, role: 'lead' | 'designer' | 'reviewer'): Promise<Page> {
  const context = await browser.newContext({ viewport: { width: 1440, height: 1100 } });
  const page = await context.newPage();
  await signIn(page, user(role).email, DEMO_PASSWORD);
  return page;
}

const review = (page: Page) => page.getByRole('region', { name: 'Review' });
const stepNode = (page: Page, id: string) => page.locator(`.react-flow__node[data-id="${id}"]`);

test('review round: designer asks, reviewer comments and flags, designer clears, lead approves; mail and inbox carry it', async ({ page, browser }) => {
  await signIn(page, user('designer').email, DEMO_PASSWORD);
  const routeId = await makeRoute(page.request, `E2E review ${Date.now()}`);
  await page.goto(`/routes/${routeId}`);
  await expect(page.getByText('Saved', { exact: true })).toBeVisible();

  // A designer cannot approve; they send the route for review, naming the reviewer.
  await expect(page.getByRole('button', { name: 'Approve' })).toHaveCount(0);
  await page.getByRole('button', { name: 'Send for review' }).click();
  const send = page.getByRole('dialog', { name: 'Send for review' });
  await send.getByRole('button', { name: 'Send for review' }).click();
  await expect(send.getByText('Name at least one reviewer.')).toBeVisible();
  await send.getByLabel(new RegExp(user('reviewer').name)).check();
  await send.getByRole('button', { name: 'Send for review' }).click();
  await expect(page.getByTestId('status-badge')).toHaveText(/In review/);

  // The reviewer is told by e-mail, with a link to the route.
  await expect
    .poll(() => readMailbox(E2E_MAIL_DIR).find((m) => m.to.includes(user('reviewer').email) && m.subject.includes('asked you to review'))?.text ?? '', { timeout: 15_000 })
    .toContain(`/routes/${routeId}`);

  const reviewer = await pageAs(browser, 'reviewer');
  await reviewer.locator('summary[aria-label^="Notifications"]').click();
  await reviewer.getByRole('button', { name: /asked you to review/ }).first().click();
  await expect(reviewer).toHaveURL(new RegExp(`/routes/${routeId}`));

  // The reviewer cannot edit, but comments on step 1; the payload shows as text and never runs.
  await expect(reviewer.getByTestId('palette-item')).toHaveCount(0);
  await stepNode(reviewer, 's1').getByTestId('step-equation').click();
  await review(reviewer).getByPlaceholder(/Comment on Step/).fill(XSS);
  await review(reviewer).getByRole('button', { name: 'Comment', exact: true }).click();
  const comment = review(reviewer).getByTestId('comment').first();
  await expect(comment).toContainText('<script>window.__xss=2</script>');
  await expect(comment.locator('strong')).toHaveText('water');
  await expect(comment.locator('img, script')).toHaveCount(0);
  expect(await reviewer.evaluate(() => (window as unknown as { __xss?: number }).__xss)).toBeUndefined();
  await expect(stepNode(reviewer, 's1').getByTestId('step-review-marks')).toHaveText('1 comment');

  // A flag on the step shows on the node and on its ladder riser.
  await review(reviewer).getByRole('tab', { name: /Flags/ }).click();
  await review(reviewer).getByLabel('Category').selectOption('safety');
  await review(reviewer).getByLabel('Why is this step weak?').fill('Reformer at 1100 K: needs a relief and burner review before any pilot run.');
  await review(reviewer).getByRole('button', { name: 'Flag step' }).click();
  await expect(stepNode(reviewer, 's1').getByTestId('step-review-marks')).toContainText('⚑ 1 flag');
  await expect(reviewer.locator('[data-step-id="s1"] [data-testid="ladder-review-marks"]')).toContainText('⚑1');

  await reviewer.getByRole('button', { name: 'Ask for changes' }).click();
  const ask = reviewer.getByRole('dialog', { name: 'Ask for changes' });
  await ask.getByLabel('What needs to change').fill('Clear the safety flag first.');
  await ask.getByRole('button', { name: 'Ask for changes' }).click();
  await expect(reviewer.getByTestId('status-badge')).toHaveText(/Changes requested/);

  // The designer was mentioned: an in-app notification and a mail.
  await page.reload();
  await expect(page.getByTestId('unread-count')).toBeVisible();
  await expect.poll(() => readMailbox(E2E_MAIL_DIR).some((m) => m.to.includes(user('designer').email) && m.subject.includes('mentioned you')), { timeout: 15_000 }).toBe(true);

  // They find the mail in the dev mailbox and follow its link straight to the step, fix it and reply.
  await page.goto('/dev/mail');
  const mail = page.getByRole('listitem').filter({ hasText: 'mentioned you' }).filter({ hasText: `/routes/${routeId}?step=s1` }).first();
  const link = (await mail.innerText()).match(/https?:\/\/\S+\/routes\/\d+\?step=s1/)![0];
  await page.goto(link);
  await expect(page.getByRole('complementary', { name: 'Step 1 details' })).toBeVisible();
  await page.getByRole('textbox', { name: /Temperature/ }).fill('1150');
  await expect(page.getByText('Saved', { exact: true })).toBeVisible({ timeout: 10_000 });
  await review(page).getByRole('button', { name: 'Reply' }).first().click();
  await review(page).getByPlaceholder('Reply').fill('Raised to 1150 K; the relief and burner review is booked.');
  await review(page).getByRole('button', { name: 'Reply', exact: true }).click();
  await expect(review(page).getByTestId('comment')).toHaveCount(2);

  // The designer clears the flag with a comment, and sends the route back.
  await review(page).getByRole('tab', { name: /Flags/ }).click();
  await review(page).getByRole('button', { name: 'Clear flag…' }).click();
  await review(page).getByPlaceholder(/Why is the flag cleared/).fill('Relief and burner review booked with process safety; kept at 1100 K.');
  await review(page).getByRole('button', { name: 'Clear flag', exact: true }).click();
  await expect(review(page).getByText('No open flags.')).toBeVisible();
  await expect(stepNode(page, 's1').getByTestId('step-review-marks')).not.toContainText('flag');
  await page.getByRole('button', { name: 'Send back for review' }).click();
  const again = page.getByRole('dialog', { name: 'Send for review' });
  await again.getByLabel(new RegExp(user('reviewer').name)).check();
  await again.getByRole('button', { name: 'Send for review' }).click();
  await expect(page.getByTestId('status-badge')).toHaveText(/In review/);

  // The reviewer resolves the thread; the earlier comment now says it was written on an earlier version.
  await reviewer.reload();
  await stepNode(reviewer, 's1').getByTestId('step-equation').click();
  const thread = review(reviewer).getByRole('article', { name: 'Thread on Step 1' }).filter({ hasText: 'Watch the' });
  await expect(thread).toContainText('written on an earlier version');
  await thread.getByRole('button', { name: 'Resolve' }).click();
  await expect(review(reviewer).getByRole('article', { name: 'Thread on Step 1' }).filter({ hasText: 'Watch the' })).toHaveCount(0);

  // Only the lead approves.
  const lead = await pageAs(browser, 'lead');
  await lead.goto(`/routes/${routeId}`);
  await lead.getByRole('button', { name: 'Approve' }).click();
  await lead.getByRole('dialog', { name: 'Approve this route' }).getByRole('button', { name: 'Approve' }).click();
  await expect(lead.getByTestId('status-badge')).toHaveText(/Approved/);
  await expect
    .poll(() => readMailbox(E2E_MAIL_DIR).find((m) => m.to.includes(user('designer').email) && /to approved/i.test(m.subject))?.text ?? '', { timeout: 15_000 })
    .toMatch(/rates/);
});

test('history: every save is a revision; two compare field by field, and a restore brings the old route back as a new revision', async ({ page }) => {
  await signIn(page, user('designer').email, DEMO_PASSWORD);
  const routeId = await makeRoute(page.request, `E2E history ${Date.now()}`);
  await page.goto(`/routes/${routeId}`);
  await stepNode(page, 's2').getByTestId('step-equation').click();
  await page.getByRole('textbox', { name: /Temperature/ }).fill('650');
  await expect(page.getByText('Saved', { exact: true })).toBeVisible({ timeout: 10_000 });

  await review(page).getByRole('tab', { name: 'History' }).click();
  const list = review(page).getByRole('list', { name: 'Revisions, newest first' });
  await expect(list.getByRole('listitem')).toHaveCount(3);
  await expect(list.getByRole('listitem').first()).toContainText('T of Step 2 (methanol from carbon monoxide) 500 → 650 K');
  await review(page).getByLabel('Compare revision 2').check();
  await review(page).getByLabel('Compare revision 3').check();
  const diff = review(page).getByLabel('Changes from revision 2 to 3');
  await expect(diff).toContainText('Temperature');
  await expect(diff).toContainText('500 K');
  await expect(diff).toContainText('650 K');

  await list.getByRole('listitem').nth(1).getByRole('button', { name: 'Restore' }).click();
  await page.getByRole('dialog', { name: 'Restore revision 2?' }).getByRole('button', { name: 'Restore' }).click();
  await expect(list.getByRole('listitem')).toHaveCount(4);
  await expect(list.getByRole('listitem').first()).toContainText('Restored revision 2');
  await stepNode(page, 's2').getByTestId('step-equation').click();
  await expect(page.getByRole('textbox', { name: /Temperature/ })).toHaveValue('500');

  await review(page).getByRole('tab', { name: 'Activity' }).click();
  const feed = review(page).getByRole('list', { name: 'Activity, newest first' });
  await expect(feed.getByRole('listitem').first()).toContainText('Restored revision 2');
});
