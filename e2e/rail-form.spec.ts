import { expect, test } from '@playwright/test';
import { DEMO, signInAs, snap } from './support/session';
import { newMachineWithRail } from './support/machine-with-rail';

test.describe('rail form', () => {
  // A phone: the form's fields stack and each message sits under its own field.
  test.use({ viewport: { width: 390, height: 844 } });

  test('each problem shows under its own field, goes as it is fixed, and a decimal comma is read', async ({ page }) => {
    await signInAs(page, DEMO.builder);
    await newMachineWithRail(page, `Rail form table ${Date.now()}`, {
      lengthMm: 600,
      holePitchMm: 100,
      firstHoleMm: 50,
    });
    await page.getByRole('button', { name: 'Edit rail' }).click();
    const edit = page.getByRole('dialog', { name: 'Edit rail Y1 (left)' });
    await expect(edit.getByLabel('Length')).toHaveValue('600');
    await edit.getByLabel('Label').fill('');
    await edit.getByLabel('Length').fill('5');
    await edit.getByRole('button', { name: 'Save rail' }).click();
    await expect(edit.getByText('Give the rail a label, e.g. "Y1 (left)"')).toBeVisible();
    await expect(edit.getByText('Between 10 and 20 000 mm')).toBeVisible();
    await snap(page, 'rail-form-problems-phone');
    // The first hole (50 mm) is beyond a 5 mm rail only once the length is at least 10 mm: not flagged yet.
    await expect(edit.getByText("From the rail's start to the first hole centre")).toBeVisible();
    await edit.getByLabel('Label').fill('Y1 (left side)');
    await expect(edit.getByText('Give the rail a label, e.g. "Y1 (left)"')).toBeHidden();
    await expect(edit.getByText('How the rail is known, e.g. Y1 (left)')).toBeVisible();
    await edit.getByLabel('Length').fill('40');
    await expect(edit.getByText('Must lie on the rail (not beyond its length)')).toBeVisible();
    await edit.getByLabel('Length').fill('700,5');
    await expect(edit.getByText('Must lie on the rail (not beyond its length)')).toBeHidden();
    await edit.getByRole('button', { name: 'Save rail' }).click();
    await expect(edit).toBeHidden();
    await expect(page.getByRole('heading', { name: 'Rail Y1 (left side)' })).toBeVisible();
    await page.getByRole('button', { name: 'Edit rail' }).click();
    await expect(page.getByRole('dialog', { name: 'Edit rail Y1 (left side)' }).getByLabel('Length')).toHaveValue(
      '700.5',
    );
  });
});
