import { expect, test, type Page } from '@playwright/test';
import { DEMO, signInAs, snap } from './support/session';
import { newMachineWithRail } from './support/machine-with-rail';

const PHONE = { width: 390, height: 844 };
const TABLET = { width: 820, height: 1180 };

// 600 mm rail, holes every 100 mm from 50 mm: stations at 50, 150 … 550 mm.
const RAIL = { lengthMm: 600, holePitchMm: 100, firstHoleMm: 50 };

async function typeReadings(page: Page, readings: string[]) {
  await page.getByLabel('Reading at 50 mm').click();
  for (const r of readings) {
    await page.keyboard.type(r);
    await page.keyboard.press('Enter');
  }
}

test.describe('sweep entry grid and sweep details', () => {
  test('Enter goes to the next station, Tab skips the remove buttons, a removed station comes back with Undo', async ({
    page,
  }) => {
    await signInAs(page, DEMO.builder);
    await newMachineWithRail(page, `Grid table ${Date.now()}`, RAIL);
    const reading = (mm: number) => page.getByLabel(`Reading at ${mm} mm`);

    // Enter: to the next row's reading, the first entry cell of the row.
    await reading(50).click();
    await page.keyboard.type('0');
    await page.keyboard.press('Enter');
    await expect(reading(150)).toBeFocused();
    await page.keyboard.type('1');
    // Tab: to the next reading too, past the position field and the remove button of the row.
    await page.keyboard.press('Tab');
    await expect(reading(250)).toBeFocused();
    await page.keyboard.type('2');
    await page.keyboard.press('Shift+Tab');
    await expect(reading(150)).toBeFocused();
    await expect(page.getByRole('button', { name: 'Drop station 2' })).toHaveAttribute('tabindex', '-1');

    // Enter never drops a row, even many times over.
    const rows = page.getByRole('table', { name: 'Stations and readings' }).getByRole('row');
    await expect(rows).toHaveCount(7);
    for (let k = 0; k < 3; k++) await page.keyboard.press('Enter');
    await expect(rows).toHaveCount(7);

    // Ctrl+Delete in a reading (the remove button's keyboard way) drops that station; Undo puts it back.
    await reading(150).click();
    await page.keyboard.press('Control+Delete');
    await expect(rows).toHaveCount(6);
    await expect(reading(150)).toHaveCount(0);
    const snackbar = page.getByText('Removed station 2 at 150 mm (reading 1)');
    await expect(snackbar).toBeVisible();
    await page.getByRole('button', { name: 'Undo removing station 2' }).click();
    await expect(rows).toHaveCount(7);
    await expect(reading(150)).toHaveValue('1');

    // The button removes too, and Undo brings it back at its place.
    await page.getByRole('button', { name: 'Drop station 3' }).click();
    await expect(reading(250)).toHaveCount(0);
    await page.getByRole('button', { name: 'Undo removing station 3' }).click();
    await expect(reading(250)).toHaveValue('2');
    await expect(page.getByRole('button', { name: /Undo removing station/ })).toHaveCount(0);
  });

  test("a sweep's datum and notes are corrected from the history; the history of the machine names the change", async ({
    page,
  }) => {
    await signInAs(page, DEMO.builder);
    await newMachineWithRail(page, `Datum table ${Date.now()}`, RAIL);
    await typeReadings(page, ['0', '1', '2', '1', '0.5', '0']);
    // The usual torque is only offered: not recorded unless used.
    await expect(page.getByText('recorded only if typed or used')).toBeVisible();
    await page.getByRole('button', { name: 'Save sweep' }).click();
    await expect(page.getByRole('region', { name: 'Sweep saved' })).toBeVisible();
    const railId = page.url().split('/rails/')[1].split(/[/?#]/)[0];
    const [listed] = await (await page.request.get(`/api/rails/${railId}/sweeps`)).json();
    const saved = await (await page.request.get(`/api/sweeps/${listed.id}`)).json();
    expect(saved).toMatchObject({ boltSize: 'M5', torqueNm: null, datum: null });

    const history = page.getByRole('region', { name: 'Sweep history' });
    await history.getByRole('button', { name: /Edit details of the sweep of/ }).click();
    const dialog = page.getByRole('dialog', { name: /Edit details of the sweep of/ });
    await expect(dialog.getByLabel('Instrument')).toHaveValue('');
    // A temperature that is not a number and an empty "Taken by" are named under their fields; nothing is sent.
    const patches: string[] = [];
    page.on('request', (r) => {
      if (r.method() === 'PATCH' && new URL(r.url()).pathname === `/api/sweeps/${listed.id}`) patches.push(r.url());
    });
    const takenBy = dialog.getByLabel('Taken by');
    const who = await takenBy.inputValue();
    expect(who).not.toBe('');
    const temperature = await dialog.getByLabel('Temperature').inputValue();
    await takenBy.fill('');
    await dialog.getByLabel('Temperature').fill('warm');
    await dialog.getByRole('button', { name: 'Save details' }).click();
    await expect(takenBy).toHaveAccessibleDescription('Say who took the sweep');
    await expect(dialog.getByLabel('Temperature')).toHaveAccessibleDescription('Temperature must be a number of °C');
    await expect(dialog.getByLabel('Temperature')).toHaveAttribute('aria-invalid', 'true');
    expect(patches).toEqual([]);
    await takenBy.fill(who);
    await dialog.getByLabel('Temperature').fill(temperature);
    await expect(dialog.getByLabel('Temperature')).toHaveAttribute('aria-invalid', 'false');
    await dialog.getByLabel('Datum').fill('Granite bar across Y1 and Y2');
    await dialog.getByLabel('Notes').fill('Datum named after the sweep');
    await dialog.getByLabel('Torque').fill('-3');
    await page.setViewportSize(PHONE);
    await snap(page, 'sweep-edit-details-phone');
    await page.setViewportSize(TABLET);
    await snap(page, 'sweep-edit-details-tablet');
    // The server refuses a negative torque, naming it; nothing is changed and the dialog stays.
    await dialog.getByRole('button', { name: 'Save details' }).click();
    await expect(dialog.getByText(/torqueNm must not be negative/)).toBeVisible();
    await dialog.getByLabel('Torque').fill('');
    await dialog.getByRole('button', { name: 'Save details' }).click();
    await expect(dialog).toBeHidden();
    expect(patches).toHaveLength(2);
    await expect(history).toContainText('Granite bar across Y1 and Y2');

    const after = await (await page.request.get(`/api/sweeps/${listed.id}`)).json();
    expect(after).toMatchObject({
      datum: 'Granite bar across Y1 and Y2',
      notes: 'Datum named after the sweep',
      torqueNm: null,
      boltSize: 'M5',
    });
    expect(after.stations).toEqual(saved.stations);
    const machineId = saved.machineId as string;
    const entries = (await (await page.request.get(`/api/machines/${machineId}/history?limit=50`)).json()).entries as {
      recordType: string;
      action: string;
      changes: { before?: object; after?: object } | null;
    }[];
    const edits = entries.filter((e) => e.recordType === 'rail-sweep' && e.action === 'updated');
    expect(edits).toHaveLength(1);
    expect(edits[0].changes).toEqual({
      before: { datum: null, notes: '' },
      after: { datum: 'Granite bar across Y1 and Y2', notes: 'Datum named after the sweep' },
    });
  });

  test('a deleted sweep can be brought back with Undo; otherwise the delete is sent a few seconds later', async ({
    page,
  }) => {
    await signInAs(page, DEMO.builder);
    await newMachineWithRail(page, `Delete table ${Date.now()}`, RAIL);
    await typeReadings(page, ['0', '1', '2', '1', '0.5', '0']);
    await page.getByRole('button', { name: 'Save sweep' }).click();
    await expect(page.getByRole('region', { name: 'Sweep saved' })).toBeVisible();
    const railId = page.url().split('/rails/')[1].split(/[/?#]/)[0];
    const count = async () =>
      ((await (await page.request.get(`/api/rails/${railId}/sweeps`)).json()) as unknown[]).length;
    const history = page.getByRole('region', { name: 'Sweep history' });
    const rows = history.getByRole('table', { name: 'Sweeps' }).locator('tbody tr');
    await expect(rows).toHaveCount(1);

    await history.getByRole('button', { name: /Delete the sweep of/ }).click();
    await expect(rows).toHaveCount(0);
    await expect(page.getByText(/Deleted the sweep of/)).toBeVisible();
    await page.getByRole('button', { name: /Undo deleting the sweep of/ }).click();
    await expect(rows).toHaveCount(1);
    await page.waitForTimeout(9000);
    expect(await count()).toBe(1);

    await history.getByRole('button', { name: /Delete the sweep of/ }).click();
    await expect(rows).toHaveCount(0);
    expect(await count()).toBe(1);
    await expect.poll(count, { timeout: 20_000 }).toBe(0);
    await expect(page.getByText(/Deleted the sweep of/)).toHaveCount(0);
  });
});
