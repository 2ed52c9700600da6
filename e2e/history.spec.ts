import { expect, test, type Locator, type Page } from '@playwright/test';
import { DEMO, signInAs, snap } from './support/session';

const WIDTHS = [1366, 820, 390] as const;
// The entries themselves, not the lines of values inside each.
const entries = (list: Locator) => list.locator(':scope > li');

/** A fresh machine with a known number of changes, made through the API as the owner. */
async function machineWithChanges(page: Page, changes: number): Promise<string> {
  const made = await page.request.post('/api/machines', {
    data: { name: `History bench ${Date.now() % 100000}`, kind: 'router', workArea: { x: 900, y: 600 } },
  });
  expect(made.status()).toBe(201);
  const { id } = await made.json();
  for (let i = 1; i <= changes; i++) {
    expect((await page.request.patch(`/api/machines/${id}`, { data: { notes: `Note number ${i}` } })).status()).toBe(
      200,
    );
  }
  return id;
}

test.describe('history', () => {
  test('the machine history tab pages with load more and filters by kind, person and date', async ({ page }) => {
    await signInAs(page, DEMO.owner);
    const id = await machineWithChanges(page, 30);
    await page.goto(`/machines/${id}?tab=history`);
    const list = page.getByRole('list', { name: 'History' });
    await expect(entries(list)).toHaveCount(25);
    // Newest first, with the values before and after, and a time with its zone.
    await expect(entries(list).first()).toContainText('notes: Note number 29 → Note number 30');
    await expect(entries(list).first()).toContainText(/\d{1,2}:\d{2}.*(GMT|UTC|[A-Z]{2,5})/);
    await expect(list).not.toContainText(/[0-9a-f]{8}-[0-9a-f]{4}-/);
    await page.getByRole('button', { name: 'Load more' }).click();
    await expect(entries(list)).toHaveCount(31);
    await expect(page.getByRole('button', { name: 'Load more' })).toHaveCount(0);
    for (const width of WIDTHS) {
      await page.setViewportSize({ width, height: 900 });
      await snap(page, `history-machine-${width}`);
    }
    await page.setViewportSize({ width: 1366, height: 900 });

    const filters = page.getByRole('search', { name: 'Filter the history' });
    await filters.getByLabel('Person').fill('nobody by this name');
    await expect(page.getByText('Nothing matches these filters')).toBeVisible();
    await filters.getByLabel('Person').fill('Owen');
    await expect(entries(list)).toHaveCount(25);
    await filters.getByLabel('Kind').click();
    await page.getByRole('option', { name: 'Rail sweep' }).click();
    await expect(page.getByText('Nothing matches these filters')).toBeVisible();
    await filters.getByLabel('Kind').click();
    await page.getByRole('option', { name: 'Machine', exact: true }).click();
    await expect(entries(list)).toHaveCount(25);
    await filters.getByLabel('From').fill('2099-01-01');
    await expect(page.getByText('Nothing matches these filters')).toBeVisible();
    await filters.getByLabel('To').fill('2098-01-01');
    await expect(filters.getByText('To must be on or after From')).toBeVisible();
    await page.getByRole('button', { name: 'Clear filters' }).click();
    // Back to the unfiltered list, with the pages already loaded.
    await expect(entries(list)).toHaveCount(31);
  });

  test('the workshop activity page shows people, sign-ins and machines to admins and owners only', async ({
    page,
    browser,
  }) => {
    await signInAs(page, DEMO.admin);
    const reset = await page.request.get('/api/people');
    expect(reset.status()).toBe(200);
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Activity' }).click();
    await expect(page.getByRole('heading', { name: 'Activity' })).toBeVisible();
    const list = page.getByRole('list', { name: 'History' });
    await expect(entries(list).first()).toBeVisible();
    const filters = page.getByRole('search', { name: 'Filter the history' });
    await filters.getByLabel('Kind').click();
    await page.getByRole('option', { name: 'Sign-in' }).click();
    await expect(entries(list).first()).toContainText('signed in');
    for (const width of WIDTHS) {
      await page.setViewportSize({ width, height: 900 });
      if (width < 900) {
        await page.getByRole('button', { name: 'Open navigation' }).isVisible();
      }
      await snap(page, `history-activity-${width}`);
    }
    // A technician has no activity page in the navigation, and the server refuses the list.
    const tech = await browser.newPage();
    await signInAs(tech, DEMO.technician);
    await expect(tech.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Activity' })).toHaveCount(0);
    expect((await tech.request.get('/api/history')).status()).toBe(403);
    await tech.close();
  });
});
