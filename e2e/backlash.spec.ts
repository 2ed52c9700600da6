import { expect, test, type Page } from '@playwright/test';
import { readFile } from 'node:fs/promises';
import { newAxis } from './support/machine-with-axis';
import { DEMO, signInAs, snap } from './support/session';

// Hand-worked (backend/src/engine/backlash.spec.ts): backlash = |mean up − mean down| per position,
// largest reported (TRADE.md, common practice). µm: 20, 17 and 29 → 29 µm at the far end.
const READINGS = [
  { up: ['12', '10', '11'], down: ['-8', '-10', '-9'] },
  { up: ['20', '22', '24'], down: ['5', '4', '6'] },
  { up: ['0', '2', '1'], down: ['31', '29', '30'] },
];

async function pickReadingUnit(page: Page, label: string) {
  await page.getByLabel('Readings in').click();
  await page.getByRole('option', { name: label, exact: true }).click();
}

test.describe('backlash check', () => {
  test('a technician enters readings from both sides at both ends and the middle; Enter moves on and never clears', async ({
    page,
  }) => {
    await signInAs(page, DEMO.technician);
    const { machineId, axisId } = await newAxis(page.request, `Backlash test ${Date.now()}`);
    await page.goto(`/machines/${machineId}/axes/${axisId}`);
    const section = page.getByRole('region', { name: 'Backlash check' });
    await expect(section.getByText('No backlash check yet')).toBeVisible({ timeout: 30_000 });
    // Positions start near both ends and in the middle of the 926 mm travel.
    await expect(page.getByLabel('Position 1', { exact: true })).toHaveValue('46');
    await expect(page.getByLabel('Position 2', { exact: true })).toHaveValue('463');
    await expect(page.getByLabel('Position 3', { exact: true })).toHaveValue('880');
    await pickReadingUnit(page, 'µm');

    // Row 1 typed along with Tab; Enter goes to the next row's first cell and keeps what was typed.
    await page.getByLabel('Up 1 at position 1').click();
    const row1 = [...READINGS[0].up, ...READINGS[0].down];
    for (let i = 0; i < row1.length; i++) {
      await page.keyboard.type(row1[i]);
      if (i < row1.length - 1) await page.keyboard.press('Tab');
    }
    await page.keyboard.press('Enter');
    await expect(page.getByLabel('Position 2', { exact: true })).toBeFocused();
    await expect(page.getByLabel('Down 3 at position 1')).toHaveValue('-9');
    await expect(page.getByLabel('Position 2', { exact: true })).toHaveValue('463');
    await page.keyboard.press('Enter');
    await expect(page.getByLabel('Position 3', { exact: true })).toBeFocused();
    await expect(page.getByLabel('Position 2', { exact: true })).toHaveValue('463');
    for (const r of [1, 2]) {
      for (let i = 0; i < 3; i++) {
        await page.getByLabel(`Up ${i + 1} at position ${r + 1}`).fill(READINGS[r].up[i]);
        await page.getByLabel(`Down ${i + 1} at position ${r + 1}`).fill(READINGS[r].down[i]);
      }
    }
    // Enter on the last position adds one and goes to it. Remove buttons are reached by pointer,
    // never by Tab, and a removed position comes back, readings and all, with Undo.
    await page.getByLabel('Down 3 at position 3').press('Enter');
    await expect(page.getByLabel('Position 4', { exact: true })).toBeFocused();
    const remove4 = page.getByRole('button', { name: 'Remove position 4' });
    await expect(remove4).toHaveAttribute('tabindex', '-1');
    await page.getByRole('button', { name: 'Remove position 2' }).click();
    await expect(page.getByLabel('Position 2', { exact: true })).toHaveValue('880');
    await expect(page.getByText('Removed position 2 (463 mm)')).toBeVisible();
    await page.getByRole('button', { name: 'Undo' }).click();
    await expect(page.getByLabel('Position 2', { exact: true })).toHaveValue('463');
    await expect(page.getByLabel('Up 1 at position 2')).toHaveValue(READINGS[1].up[0]);
    await remove4.click();
    await expect(page.getByLabel('Position 4', { exact: true })).toHaveCount(0);
    await page.getByLabel('Position 3', { exact: true }).fill('900');
    await page.getByRole('button', { name: 'Record backlash check' }).click();

    const result = page.getByRole('region', { name: 'Backlash result' });
    await expect(result).toContainText('Backlash 29.0 µm');
    await expect(result).toContainText('(0.0290 mm) largest, at 900 mm');
    await expect(result.getByText('Within target')).toBeVisible();
    await expect(result).toContainText('≤ 0.03 mm');
    const rows = result.getByRole('table', { name: 'Backlash at each position' }).getByRole('row');
    await expect(rows.nth(1)).toContainText('20.0');
    await expect(rows.nth(2)).toContainText('17.0');
    await expect(rows.nth(3)).toContainText('29.0');
    await expect(result).toContainText('ISO 230-2 reversal value for one target');
    await snap(page, 'axis-backlash-desktop');

    // A coarse indicator is warned about; a position beyond the travel is refused in words.
    await page.getByLabel('Indicator resolution').fill('10');
    await page.getByRole('button', { name: 'Record backlash check' }).click();
    await expect(
      result.getByRole('alert').filter({ hasText: 'coarser than a quarter of the 30.0 µm target' }),
    ).toBeVisible();
    await page.getByLabel('Position 3', { exact: true }).fill('950');
    await page.getByRole('button', { name: 'Record backlash check' }).click();
    await expect(
      section.getByRole('alert').filter({ hasText: "beyond the axis's measured travel of 926 mm" }),
    ).toBeVisible();
    await expect(page.getByLabel('Down 3 at position 3')).toHaveValue('30');
    await expect(page.getByLabel('Showing the check of')).toBeVisible();
  });

  test('a viewer reads the check but gets no entry grid', async ({ page, browser }) => {
    await signInAs(page, DEMO.technician);
    const { machineId, axisId } = await newAxis(page.request, `Backlash test ${Date.now()}`);
    const positions = READINGS.map((r, i) => ({
      position: [46, 463, 900][i],
      up: r.up.map(Number),
      down: r.down.map(Number),
    }));
    expect(
      (
        await page.request.post(`/api/axes/${axisId}/backlash-checks`, { data: { readingUnit: 'um', positions } })
      ).status(),
    ).toBe(201);
    const viewer = await browser.newPage();
    await signInAs(viewer, DEMO.viewer);
    await viewer.goto(`/machines/${machineId}/axes/${axisId}`);
    await expect(viewer.getByRole('region', { name: 'Backlash result' })).toContainText('Backlash 29.0 µm');
    await expect(viewer.getByRole('button', { name: 'Record backlash check' })).toHaveCount(0);
    await viewer.close();
  });

  test('a check typed without a connection waits where it will land, is recorded once when it returns, and one recorded in error is deleted', async ({
    page,
    context,
  }) => {
    await signInAs(page, DEMO.technician);
    const { machineId, axisId } = await newAxis(page.request, `Backlash test ${Date.now()}`);
    const listPath = `/api/axes/${axisId}/backlash-checks`;
    const keys: string[] = [];
    page.on('request', (r) => {
      if (r.method() === 'POST' && new URL(r.url()).pathname === listPath) keys.push(r.headers()['idempotency-key']);
    });
    const positions = READINGS.map((r, i) => ({
      position: [46, 463, 900][i],
      up: r.up.map(Number),
      down: r.down.map(Number),
    }));
    const first = await page.request.post(listPath, { data: { readingUnit: 'um', positions, notes: 'First mount' } });
    expect(first.status()).toBe(201);
    await page.goto(`/machines/${machineId}/axes/${axisId}`);
    const section = page.getByRole('region', { name: 'Backlash check' });
    const result = page.getByRole('region', { name: 'Backlash result' });
    await expect(result).toContainText('First mount', { timeout: 30_000 });

    await context.setOffline(true);
    await pickReadingUnit(page, 'µm');
    await page.getByLabel('Position 3', { exact: true }).fill('900');
    for (let r = 0; r < 3; r++) {
      for (let i = 0; i < 3; i++) {
        await page.getByLabel(`Up ${i + 1} at position ${r + 1}`).fill(READINGS[r].up[i]);
        await page.getByLabel(`Down ${i + 1} at position ${r + 1}`).fill(READINGS[r].down[i]);
      }
    }
    await section.getByLabel('Notes', { exact: true }).fill('Gib tightened');
    await page.getByRole('button', { name: 'Record backlash check' }).click();
    // Shown waiting in the form, which is free for the next check.
    await expect(section.getByLabel('Entries waiting to be sent')).toContainText(
      'Backlash check of axis X (3 positions)',
    );
    await expect(page.getByLabel('Up 1 at position 1')).toHaveValue('');

    await context.setOffline(false);
    await expect(section.getByLabel('Entries waiting to be sent')).toHaveCount(0, { timeout: 30_000 });
    // The list is asked again: the new check is shown, the first one offered in the picker.
    await expect(result).toContainText('Gib tightened');
    await expect(page.getByLabel('Showing the check of')).toBeVisible();
    const recorded = (await (await page.request.get(listPath)).json()) as { notes: string }[];
    expect(recorded.map((c) => c.notes)).toEqual(['Gib tightened', 'First mount']);
    expect(new Set(keys).size).toBe(1);

    await result.getByRole('button', { name: 'Delete this backlash check' }).click();
    await result.getByRole('button', { name: 'Delete', exact: true }).click();
    await expect(result).toContainText('First mount');
    await expect(page.getByLabel('Showing the check of')).toHaveCount(0);
    const left = (await (await page.request.get(listPath)).json()) as { notes: string }[];
    expect(left.map((c) => c.notes)).toEqual(['First mount']);
  });

  test('the test program shows the server target list and keeps a note inside its comment', async ({ page }) => {
    await signInAs(page, DEMO.technician);
    const { machineId, axisId } = await newAxis(page.request, `Backlash test ${Date.now()}`);
    const targets = (await (await page.request.get(`/api/axes/${axisId}/test-targets`)).json()) as {
      targets: number[];
    };
    await page.goto(`/machines/${machineId}/axes/${axisId}`);
    await page.getByRole('button', { name: 'Download test program' }).click();
    const dialog = page.getByRole('dialog');
    await expect(dialog).toContainText(`Blank: ${targets.targets.join(', ')} mm`);
    await dialog.getByLabel("A note for the program's header").fill('dial on carriage (G0 X-500); 100% %');
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      dialog.getByRole('button', { name: 'Download' }).click(),
    ]);
    const text = await readFile((await download.path())!, 'utf8');
    expect(text).toContain('(Notes: dial on carriage G0 X-500 100)');
    expect(text).toMatch(/^G17 G21 G90 G94 G40 G80 /m);
    expect(text.split('\n').filter((l) => l.startsWith('M1')).length).toBe(targets.targets.length * 5 * 2);
    expect(text.split('\n').filter((l) => l === '%')).toHaveLength(2);
  });
});
