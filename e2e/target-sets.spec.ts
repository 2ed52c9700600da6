import { expect, test } from '@playwright/test';
import { DEMO, signInAs, snap } from './support/session';

test.describe('target sets', () => {
  for (const [size, viewport] of [
    ['phone', { width: 390, height: 844 }],
    ['desktop', { width: 1280, height: 900 }],
  ] as const) {
    test(`an owner makes a set as a copy, is kept from a name already used, and renames it (${size})`, async ({
      page,
    }) => {
      await page.setViewportSize(viewport);
      await signInAs(page, DEMO.owner);
      await page.goto('/target-sets');
      await page.getByRole('button', { name: 'Copy Router (default)' }).click();
      const dialog = page.getByRole('dialog', { name: 'New target set' });
      await expect(dialog.getByLabel('Name')).toHaveValue('Router (default) (copy)');
      // A name another set already has is refused before anything is sent.
      await dialog.getByLabel('Name').fill('plasma table (default)');
      await expect(dialog).toContainText('Another target set has this name');
      await expect(dialog.getByRole('button', { name: 'Make target set' })).toBeDisabled();
      await dialog.getByLabel('Name').fill('  ');
      await expect(dialog.getByLabel('Name')).toHaveAccessibleDescription('A name is needed');
      await expect(dialog.getByRole('button', { name: 'Make target set' })).toBeDisabled();
      const name = `Router tight ${size} ${Date.now()}`;
      await dialog.getByLabel('Name').fill(name);
      await snap(page, `target-set-new-${size}`);
      await dialog.getByRole('button', { name: 'Make target set' }).click();
      await expect(dialog).toBeHidden();
      // Every target came along, with its value and unit.
      const copied = page.getByRole('table', { name: `Targets of ${name}` });
      const original = page.getByRole('table', { name: 'Targets of Router (default)' });
      await expect(copied).toBeVisible();
      expect(await copied.getByRole('row').allInnerTexts()).toEqual(await original.getByRole('row').allInnerTexts());
      // Renamed through its edit dialog.
      await page.getByRole('button', { name: `Edit ${name}` }).click();
      const edit = page.getByRole('dialog');
      // Each field's problem shows under it as it is typed, and nothing can be saved meanwhile.
      const save = edit.getByRole('button', { name: 'Save targets' });
      const interval = edit.getByLabel('Re-check interval: value');
      const before = await interval.inputValue();
      await interval.fill('-1');
      await expect(interval).toHaveAccessibleDescription('A number of 0 or more');
      await edit.getByLabel('Name').fill('');
      await expect(edit.getByLabel('Name')).toHaveAccessibleDescription('A name is needed');
      await expect(save).toBeDisabled();
      await interval.fill(before);
      await expect(interval).toHaveAccessibleDescription('');
      await expect(save).toBeDisabled();
      await edit.getByLabel('Name').fill(`${name} (renamed)`);
      await expect(edit.getByLabel('Name')).toHaveAccessibleDescription('');
      await edit.getByRole('button', { name: 'Save targets' }).click();
      await expect(page.getByRole('heading', { name: `${name} (renamed)` })).toBeVisible();
      expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(viewport.width);
      await snap(page, `target-sets-${size}`);
    });
  }

  test('a builder reads target sets but cannot make or copy them', async ({ page }) => {
    await signInAs(page, DEMO.builder);
    await page.goto('/target-sets');
    await expect(page.getByRole('table', { name: 'Targets of Router (default)' })).toBeVisible();
    await expect(page.getByRole('button', { name: 'New target set' })).toHaveCount(0);
    await expect(page.getByRole('button', { name: /^Copy / })).toHaveCount(0);
  });
});
