import { expect, test, type Page } from '@playwright/test';
import { DEMO_PASSWORD, DEMO_USERS } from '../../db/seeders/demo-team';
import { signIn } from './support/auth';

// Phone (390 px) and tablet (768 px): no page scrolls sideways, and the navigation sits behind a Menu button.
// Wide tables may scroll inside their own region; only the page itself is measured.

const LEAD = DEMO_USERS.find((u) => u.role === 'lead')!.email;

/** The page is no wider than the window; on failure, names the widest elements that stick out (outside scrollers). */
async function expectNoSidewaysScroll(page: Page, where: string) {
  await expect
    .poll(
      () =>
        page.evaluate(() => {
          const vw = window.innerWidth;
          if (document.documentElement.scrollWidth <= vw) return 'fits';
          const culprits: string[] = [];
          for (const el of Array.from(document.querySelectorAll('body *'))) {
            const box = el.getBoundingClientRect();
            if (box.right <= vw + 0.5 || box.width === 0) continue;
            let inScroller = false;
            for (let a = el.parentElement; a && !inScroller; a = a.parentElement) inScroller = getComputedStyle(a).overflowX !== 'visible';
            if (!inScroller) culprits.push(`${el.tagName.toLowerCase()}[${String(el.getAttribute('class') ?? '').slice(0, 60)}] right=${Math.round(box.right)}`);
          }
          return `scrollWidth ${document.documentElement.scrollWidth} > ${vw}: ${culprits.slice(-6).join('; ')}`;
        }),
      { message: `${where} scrolls sideways` },
    )
    .toBe('fits');
}

async function demoRouteIds(page: Page): Promise<[number, number]> {
  const answer = await page.request.get('/api/routes?q=Methanol%20via&pageSize=50');
  expect(answer.ok()).toBe(true);
  const { items } = (await answer.json()) as { items: { id: number; name: string }[] };
  const reforming = items.find((r) => r.name.startsWith('Methanol via steam reforming'));
  const oxidation = items.find((r) => r.name.startsWith('Methanol via partial oxidation'));
  expect(reforming, 'the demo steam-reforming route').toBeTruthy();
  expect(oxidation, 'the demo partial-oxidation route').toBeTruthy();
  return [reforming!.id, oxidation!.id];
}

for (const width of [390, 768] as const) {
  const isPhone = width < 768;

  test.describe(`${width} px wide`, () => {
    test.use({ viewport: { width, height: 844 } });

    test('every page fits the width, and the menu holds the navigation', async ({ page }) => {
      await signIn(page, LEAD, DEMO_PASSWORD);
      const [reforming, oxidation] = await demoRouteIds(page);

      // Routes list: cards on a phone, the table (in its own scroller) on a tablet.
      if (isPhone) {
        await expect(page.getByRole('list', { name: 'Routes of your team' }).getByRole('listitem').first()).toBeVisible();
        await expect(page.getByRole('table', { name: 'Routes of your team' })).toHaveCount(0);
      } else {
        await expect(page.getByRole('table', { name: 'Routes of your team' }).getByRole('row').nth(1)).toBeVisible();
      }
      await expectNoSidewaysScroll(page, 'the routes list');

      // The menu: a disclosure that opens the sections, the team switcher and the account; Escape closes it.
      const menu = page.getByRole('button', { name: 'Menu' });
      await expect(menu).toHaveAttribute('aria-expanded', 'false');
      await expect(page.getByRole('navigation', { name: 'Main' })).toHaveCount(0);
      await menu.click();
      await expect(menu).toHaveAttribute('aria-expanded', 'true');
      const nav = page.getByRole('navigation', { name: 'Main' });
      await expect(nav.getByRole('link', { name: 'Decisions' })).toBeVisible();
      await expect(page.getByRole('combobox', { name: 'Team' })).toBeVisible();
      await expect(page.getByRole('button', { name: 'Sign out' })).toBeVisible();
      await expectNoSidewaysScroll(page, 'the open menu');
      await page.keyboard.press('Escape');
      await expect(menu).toHaveAttribute('aria-expanded', 'false');
      await expect(menu).toBeFocused();
      await expect(nav).toHaveCount(0);

      // Inbox: the list opens under the header, inside the screen.
      const bell = page.locator('details:has(> summary[aria-label^="Notifications"])');
      await bell.locator('summary').click();
      await expect(bell).toHaveAttribute('open');
      await expect(bell.getByText('Mark all read')).toBeVisible();
      const sheet = (await bell.locator(':scope > div').boundingBox())!;
      expect(sheet.x).toBeGreaterThanOrEqual(0);
      expect(sheet.x + sheet.width).toBeLessThanOrEqual(width);
      await expectNoSidewaysScroll(page, 'the open inbox');
      await page.keyboard.press('Escape');
      await expect(bell).not.toHaveAttribute('open');

      // A demo route: read-only steps list on a phone, the board on a tablet.
      await page.goto(`/routes/${reforming}`);
      await expect(page.getByRole('heading', { level: 1, name: /Methanol via steam reforming/ })).toBeVisible();
      await expect(page.getByRole('figure').filter({ has: page.getByRole('group', { name: /Free-energy ladder/ }) })).toBeVisible();
      if (isPhone) {
        const steps = page.getByTestId('read-only-step');
        await expect(steps).toHaveCount(2);
        await expect(steps.nth(0)).toContainText('Step 1');
        await expect(steps.nth(1)).toContainText('Step 2');
        // Route order: the reformer feeds the methanol synthesis.
        await expect(steps.nth(0)).toContainText('CH4(g)');
        await expect(steps.nth(1)).toContainText('CH3OH(g)');
        // Each step says its ΔG and its class in words.
        await expect(steps.nth(0)).toContainText(/ΔG°? [+−-]?\d/);
        await expect(steps.nth(0)).toContainText(/Downhill|Marginal|Uphill/);
        await expect(page.getByText('open this route on a screen at least 768 px wide', { exact: false })).toBeVisible();
        await expect(page.getByTestId('step-node').first()).toBeHidden();
      } else {
        await expect(page.getByTestId('step-node').first()).toBeVisible();
      }
      await expect(page.getByRole('tab', { name: /Discussion/ })).toBeVisible();
      await expectNoSidewaysScroll(page, 'the route page');

      await page.goto(`/routes/compare?ids=${reforming},${oxidation}`);
      await expect(page.getByRole('figure', { name: /^Ladder of Methanol via steam reforming/ })).toBeVisible();
      await expect(page.getByRole('region', { name: 'Metrics of the compared routes' })).toBeVisible();
      await expectNoSidewaysScroll(page, 'compare');

      await page.goto('/decisions');
      await expect(page.getByText('Decisions are never edited.', { exact: false })).toBeVisible();
      await expect(page.getByText('Loading decisions…')).toBeHidden();
      await expectNoSidewaysScroll(page, 'the decision log');

      // Species list, reached through the menu: following a link closes it.
      await menu.click();
      await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Species' }).click();
      await expect(page).toHaveURL(/\/species$/);
      await expect(menu).toHaveAttribute('aria-expanded', 'false');
      await expect(page.getByRole('link', { name: /values, plot and routes/ }).first()).toBeVisible();
      await expectNoSidewaysScroll(page, 'the species list');

      // Team: the members table scrolls inside its own region; the invitations and roles stack under it.
      await page.goto('/team');
      await expect(page.getByRole('table', { name: 'Members' }).getByRole('row').nth(1)).toBeVisible();
      await expect(page.getByRole('heading', { name: 'Invite someone' })).toBeVisible();
      await expectNoSidewaysScroll(page, 'the team page');

      // Pages with wide tables or long unbroken strings (checksums, SMILES, InChIKeys): each fits as it first opens.
      for (const [path, title] of [
        ['/settings', 'Settings'],
        ['/fits', 'Data fits'],
        ['/species/import', 'Import species from CSV'],
        ['/species/from-structure', 'New species from a structure'],
        // A species page: the drawing and the identity list side by side must wrap, not squeeze.
        [`/species/${encodeURIComponent('C2H5OH(g)')}`, 'ethanol'],
      ] as const) {
        await page.goto(path);
        await expect(page.getByRole('heading', { level: 1, name: title })).toBeVisible();
        await expectNoSidewaysScroll(page, `the page ${path}`);
      }
    });
  });
}
