// The route board without a mouse (issue 19, item 7): the palette is one tab stop with arrow keys, Tab meets the
// steps in route order and the links after them, each with a visible outline, and a step's products are linked from
// its panel with refusals in words. Chemistry: the library's steam reforming, methanol synthesis and methanol
// oxidation (lib/thermo/data/reaction-library.json); no figure is asserted here.
import { expect, test, type Locator, type Page } from '@playwright/test';
import { DEMO_PASSWORD, DEMO_USERS } from '../../db/seeders/demo-team';
import { signIn } from './support/auth';

const designer = DEMO_USERS.find((u) => u.role === 'designer')!.email;

test.use({ viewport: { width: 1440, height: 1100 } });

const addButton = (page: Page, name: string) => page.getByRole('button', { name: new RegExp(`^Add step: ${name}`) });
const stepNode = (page: Page, n: number) => page.locator(`.react-flow__node[aria-label^="Step ${n} ("]`);

/** Presses Tab (or Shift+Tab) until `target` has focus, at most `max` times; answers how many presses it took. */
async function tabTo(page: Page, target: Locator, max: number, key: 'Tab' | 'Shift+Tab' = 'Tab'): Promise<number> {
  for (let i = 1; i <= max; i++) {
    await page.keyboard.press(key);
    if (await target.evaluate((el) => el === document.activeElement)) return i;
  }
  throw new Error(`not reached in ${max} presses of ${key}`);
}

async function outlineOfFocused(page: Page) {
  return page.evaluate(() => {
    const style = getComputedStyle(document.activeElement!);
    return { style: style.outlineStyle, width: parseFloat(style.outlineWidth) };
  });
}

test('palette, board and links by keyboard alone', async ({ page }) => {
  test.setTimeout(90_000);
  await signIn(page, designer, DEMO_PASSWORD);
  await page.getByRole('button', { name: 'New route' }).first().click();
  const dialog = page.getByRole('dialog', { name: 'New route' });
  await dialog.getByLabel('Name').fill(`Keyboard board ${Date.now().toString(36)}`);
  await dialog.getByLabel('Target species').fill('HCHO(g)');
  await dialog.getByRole('button', { name: 'Create route' }).click();
  await expect(page).toHaveURL(/\/routes\/\d+$/);

  // The palette is one stop for all its Add buttons; the arrow keys move between them and Enter adds.
  const palette = page.getByRole('complementary', { name: 'Step palette' });
  await expect(addButton(page, 'Steam reforming of methane')).toBeVisible();
  const stops = await palette.evaluate((el) => Array.from(el.querySelectorAll<HTMLElement>('button, a[href], input, select, textarea, [tabindex]')).filter((x) => x.tabIndex >= 0).length);
  expect(stops).toBeLessThanOrEqual(4);
  const blank = addButton(page, 'Blank step');
  await blank.focus();
  await page.keyboard.press('ArrowDown');
  await expect(blank).not.toBeFocused();
  await expect(blank).toHaveAttribute('tabindex', '-1');
  await page.keyboard.press('Home');
  await expect(blank).toBeFocused();

  for (const name of ['Steam reforming of methane', 'Methanol from carbon monoxide', 'Oxidative dehydrogenation of methanol']) {
    const button = addButton(page, name);
    await button.focus();
    await page.keyboard.press('Enter');
  }
  await expect(page.locator('.react-flow__node')).toHaveCount(3);

  // Tab from the palette's search (then its one Add stop, which stays on the last step added) reaches Step 1, then
  // Step 2 and Step 3, each with an outline.
  await page.getByRole('searchbox', { name: 'Reactions with species' }).focus();
  await tabTo(page, stepNode(page, 1), 2);
  expect(await outlineOfFocused(page)).toEqual({ style: 'solid', width: 3 });
  await tabTo(page, stepNode(page, 2), 3);
  await tabTo(page, stepNode(page, 3), 3);

  // Enter selects the focused step; its panel links a product to the step that consumes it.
  await tabTo(page, stepNode(page, 1), 8, 'Shift+Tab');
  await page.keyboard.press('Enter');
  const panel = page.getByRole('complementary', { name: /^Step 1 details/ });
  const link = panel.getByRole('group', { name: 'Link product to…' });
  await expect(link.getByLabel('Product')).toHaveValue('CO(g)');
  await expect(link.getByLabel('To step')).toHaveValue(/.+/);
  await link.getByRole('button', { name: 'Link' }).click();
  await expect(link.getByRole('status')).toHaveText('Linked: CO(g) from Step 1 (steam reforming of methane) to Step 2 (methanol from carbon monoxide).');
  await expect(page.locator('.react-flow__edge')).toHaveCount(1);

  // A step that does not consume the product is refused, in words, and no link is made.
  await link.getByLabel('Product').selectOption('CO(g)');
  await link.getByLabel('To step').selectOption({ label: 'Step 3 (oxidative dehydrogenation of methanol)' });
  await link.getByRole('button', { name: 'Link' }).click();
  await expect(link.getByRole('status')).toHaveText(/Step 3 \(oxidative dehydrogenation of methanol\) does not consume CO\(g\)\./);
  await expect(page.locator('.react-flow__edge')).toHaveCount(1);

  // After the steps, Tab reaches the link, named in words, with a visible mark.
  await stepNode(page, 3).focus();
  const edge = page.getByRole('button', { name: /^Link: CO\(g\) from Step 1 \(steam reforming of methane\) to Step 2/ });
  await tabTo(page, edge, 3);
  await expect(edge.locator('.react-flow__edge-path')).toHaveCSS('stroke-width', '4px');
});
