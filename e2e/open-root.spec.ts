import { expect, test, type Page } from '@playwright/test';
import { DEMO, signInAs } from './support/session';

/** Collects Content-Security-Policy refusals the browser reports while a page runs. */
function cspViolations(page: Page): string[] {
  const found: string[] = [];
  page.on('console', (msg) => {
    if (/Content[- ]Security[- ]Policy|Refused to (load|apply|execute)/i.test(msg.text())) found.push(msg.text());
  });
  return found;
}

test.describe('the address the start command prints', () => {
  test('signed out, / opens the sign-in page (it answered 403), with no CSP refusals', async ({ page }) => {
    const violations = cspViolations(page);
    const res = await page.goto('/');
    expect(res?.status()).toBe(200);
    expect(res?.headers()['content-security-policy']).toMatch(/default-src 'self'/);
    await expect(page).toHaveURL(/\/sign-in/);
    await expect(page.getByRole('button', { name: 'Sign in' })).toBeVisible();
    expect(violations).toEqual([]);
  });

  test('signed in, / opens the machines page, styled, with no CSP refusals', async ({ page }) => {
    const violations = cspViolations(page);
    await signInAs(page, DEMO.viewer);
    await page.goto('/');
    await expect(page).toHaveURL(/\/machines$/);
    await expect(page.getByRole('heading', { name: 'Machines' })).toBeVisible();
    // MUI's run-time styles were applied (a strict CSP without style allowances would leave the page unstyled).
    const font = await page
      .getByRole('heading', { name: 'Machines' })
      .evaluate((el) => getComputedStyle(el).fontFamily);
    expect(font).toMatch(/Roboto/);
    expect(violations).toEqual([]);
  });
});
