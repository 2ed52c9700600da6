import { expect, test, type Page } from '@playwright/test';
import path from 'node:path';
import { DEMO, signInAs, snap } from './support/session';
import { demoPlasma } from './support/demo-plasma';

// The machine file, a rail and an axis printed on paper: no app bar, navigation, buttons or
// entry forms; the results, their tables and charts kept. A PDF of each lands in e2e/screenshots/.

/** Chrome of the app and every control: none of it shows on paper. */
async function expectNoControls(page: Page) {
  await expect(page.locator('header.MuiAppBar-root')).toBeHidden();
  await expect(page.locator('nav[aria-label="Main"]')).toBeHidden();
  await expect(page.locator('[role="tablist"]:visible')).toHaveCount(0);
  await expect(
    page.locator('button:visible, .MuiButton-root:visible, [role="button"]:not(.MuiChip-root):visible'),
  ).toHaveCount(0);
  await expect(page.locator('input:visible, textarea:visible, select:visible, form:visible')).toHaveCount(0);
  await expect(page.getByText(/^Railwright · .* · printed \d{4}-\d{2}-\d{2} \d{2}:\d{2} UTC by /)).toBeVisible();
}

async function toPdf(page: Page, name: string) {
  await page.pdf({ path: path.join(__dirname, 'screenshots', `${name}.pdf`), format: 'A4', printBackground: true });
}

test('a rail printed: its results and charts, no sweep form', async ({ page }) => {
  await signInAs(page, DEMO.builder);
  const m = await demoPlasma(page);
  await page.goto(`/machines/${m.id}/rails/${m.rail.id}`);
  await expect(page.getByRole('button', { name: `Print rail ${m.rail.label}` })).toBeVisible();
  // On screen a builder has the sweep form.
  await expect(page.getByRole('button', { name: 'Save sweep' })).toBeVisible();
  await expect(page.getByRole('table', { name: 'Sweeps' })).toBeVisible();

  await page.emulateMedia({ media: 'print' });
  await expectNoControls(page);
  await expect(page.getByText('New sweep', { exact: true })).toBeHidden();
  await expect(page.getByRole('heading', { name: `Rail ${m.rail.label}` })).toBeVisible();
  await expect(page.getByRole('table', { name: 'Sweeps' })).toBeVisible();
  await expect(page.getByRole('figure', { name: 'Sweeps overlaid' })).toBeVisible();
  await expect(page.getByRole('figure', { name: 'Partner rail differences' })).toBeVisible();
  await snap(page, 'print-rail');
  await toPdf(page, 'print-rail');
});

test('an axis printed: trials, runs and backlash results, no entry grids', async ({ page }) => {
  await signInAs(page, DEMO.technician);
  const m = await demoPlasma(page);
  await page.goto(`/machines/${m.id}/axes/${m.axis.id}`);
  await expect(page.getByRole('button', { name: `Print axis ${m.axis.name}` })).toBeVisible();
  // On screen a technician has the entry grids.
  await expect(page.getByRole('table', { name: 'Travel trial moves' })).toBeVisible();
  await expect(page.getByRole('table', { name: 'Backlash readings' })).toBeVisible();
  await expect(page.getByRole('table', { name: 'Results per target' })).toBeVisible();

  await page.emulateMedia({ media: 'print' });
  await expectNoControls(page);
  await expect(page.locator('[data-indicator-cell]:visible')).toHaveCount(0);
  await expect(page.getByRole('heading', { name: `Axis ${m.axis.name}` })).toBeVisible();
  await expect(page.getByRole('table', { name: 'Travel trial moves' })).toBeHidden();
  await expect(page.getByRole('table', { name: 'Backlash readings' })).toBeHidden();
  await expect(page.getByRole('table', { name: 'Results per target' })).toBeVisible();
  await expect(page.getByRole('table', { name: 'Backlash at each position' })).toBeVisible();
  await expect(page.getByRole('figure', { name: /^Error against commanded distance/ })).toBeVisible();
  await expect(page.getByRole('figure', { name: /^Mean deviations up and down/ })).toBeVisible();
  await snap(page, 'print-axis');
  await toPdf(page, 'print-axis');
});

test('the machine file printed: the readiness board with its section named', async ({ page }) => {
  await signInAs(page, DEMO.owner);
  const m = await demoPlasma(page);
  await page.goto(`/machines/${m.id}?tab=readiness`);
  await expect(page.getByRole('table', { name: 'Required checks' })).toBeVisible();
  await expect(page.getByRole('button', { name: 'Print readiness of Big plasma table' })).toBeVisible();

  await page.emulateMedia({ media: 'print' });
  await expectNoControls(page);
  await expect(page.getByRole('heading', { name: 'Big plasma table', level: 1 })).toBeVisible();
  await expect(page.getByRole('heading', { name: 'Readiness', level: 2 }).first()).toBeVisible();
  await expect(page.getByRole('table', { name: 'Required checks' })).toBeVisible();
  await snap(page, 'print-machine-readiness');
  await toPdf(page, 'print-machine-readiness');
});
