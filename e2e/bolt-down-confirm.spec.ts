import { expect, test, type APIRequestContext, type Page } from '@playwright/test';
import { DEMO, signInAs, snap } from './support/session';

const PHONE = { width: 390, height: 844 };
const TABLET = { width: 820, height: 1180 };

/** A new plasma machine file with a 300 mm rail (holes every 60 mm from 30 mm: fixed 1, 5, 3, 2, 4), made through the API. */
async function newRail(request: APIRequestContext, name: string) {
  const machine = await request.post('/api/machines', {
    data: { name: `${name} ${Date.now()}`, kind: 'plasma', workArea: { x: 3000, y: 1500 } },
  });
  expect(machine.status()).toBe(201);
  const machineId = (await machine.json()).id as string;
  const made = await request.post(`/api/machines/${machineId}/rails`, {
    data: {
      label: 'Y1 (left)',
      axis: 'Y1',
      profileSize: 20,
      lengthUnit: 'mm',
      length: 300,
      holePitch: 60,
      firstHole: 30,
    },
  });
  expect(made.status()).toBe(201);
  return { machineId, railId: (await made.json()).id as string };
}

async function begin(page: Page, machineId: string, railId: string) {
  await page.goto(`/machines/${machineId}/rails/${railId}/bolt-down`);
  await page.getByRole('radio', { name: /Face mode/ }).check();
  await page.getByRole('button', { name: 'Begin the bolt-down' }).click();
  await expect(page.getByTestId('progress')).toHaveText('0 of 5 holes fixed');
}

async function serverHoles(request: APIRequestContext, railId: string) {
  const bd = (await (await request.get(`/api/rails/${railId}/bolt-downs`)).json())[0];
  return (await (await request.get(`/api/bolt-downs/${bd.id}`)).json()) as {
    id: string;
    holes: { index: number; fixed: boolean; reading: number | null; onTarget: boolean | null }[];
    abandoned: { reason: string } | null;
  };
}

test.describe('bolt-down: a reading outside its band, and giving a bolt-down up', () => {
  test('Enter on a miss only shows it; the confirm fixes it, and the table marks the hole as fixed outside its band', async ({
    page,
  }) => {
    await signInAs(page, DEMO.builder);
    const { machineId, railId } = await newRail(page.request, 'Confirm table');
    await begin(page, machineId, railId);
    const fixedCount = async () => (await serverHoles(page.request, railId)).holes.filter((h) => h.fixed).length;

    // Hole 1 sets the datum (face mode: every hole is aimed at it).
    await page.getByLabel('Reading at hole 1 (thou)').fill('0');
    await page.getByLabel('Reading at hole 1 (thou)').press('Enter');
    await expect(page.getByTestId('progress')).toHaveText('1 of 5 holes fixed');
    await expect.poll(fixedCount).toBe(1);

    // Hole 5 reads 8.5 thou off an aim of 0 with a band of ±1.0 thou: Enter shows the miss, fixes nothing.
    const reading5 = page.getByLabel('Reading at hole 5 (thou)');
    await reading5.fill('8.5');
    await reading5.press('Enter');
    const confirm = page.getByTestId('miss-confirm');
    await expect(confirm).toContainText('Hole 5 reads 8.5 thou above its aim');
    await expect(confirm).toContainText('7.5 thou outside it');
    await expect(page.getByRole('button', { name: 'Fix hole 5' })).toBeDisabled();
    // Enter again, and once more, still fixes nothing: the confirm is a click of its own.
    await reading5.press('Enter');
    await reading5.press('Enter');
    await page.waitForTimeout(500);
    await expect(page.getByTestId('progress')).toHaveText('1 of 5 holes fixed');
    expect(await fixedCount()).toBe(1);
    await snap(page, 'bolt-down-miss-confirm-desktop');
    await page.setViewportSize(PHONE);
    await confirm.scrollIntoViewIfNeeded();
    await snap(page, 'bolt-down-miss-confirm-phone');
    await page.setViewportSize(TABLET);
    await snap(page, 'bolt-down-miss-confirm-tablet');

    // "Keep nudging" goes back to the reading; typing a new one clears the question.
    await confirm.getByRole('button', { name: 'Keep nudging' }).click();
    await expect(reading5).toBeFocused();
    await expect(page.getByTestId('miss-confirm')).toHaveCount(0);
    await reading5.fill('8.4');
    await reading5.press('Enter');
    await page.getByTestId('miss-confirm').getByRole('button', { name: 'Fix it anyway' }).click();
    await expect(page.getByTestId('progress')).toHaveText('2 of 5 holes fixed');
    const row5 = page.getByRole('row', { name: 'Hole 5', exact: true });
    await expect(row5).toContainText('Fixed outside band', { timeout: 15_000 });
    await expect(page.getByRole('row', { name: 'Hole 1', exact: true })).toContainText(/Fixed$/);
    await expect.poll(fixedCount).toBe(2);
    const hole5 = (await serverHoles(page.request, railId)).holes[4];
    expect(hole5).toMatchObject({ fixed: true, reading: 8.4, onTarget: false });

    // Within the band, Enter fixes at once, as before.
    await page.getByLabel('Reading at hole 3 (thou)').fill('0.5');
    await page.getByLabel('Reading at hole 3 (thou)').press('Enter');
    await expect(page.getByTestId('progress')).toHaveText('3 of 5 holes fixed');
    await expect(page.getByRole('row', { name: 'Hole 3', exact: true })).toContainText(/Fixed$/, { timeout: 15_000 });
    await page.setViewportSize(PHONE);
    await snap(page, 'bolt-down-guide-phone');
  });

  test('a bolt-down is abandoned with a reason, shows as abandoned, and a new one can begin', async ({ page }) => {
    await signInAs(page, DEMO.builder);
    const { machineId, railId } = await newRail(page.request, 'Abandon table');
    await begin(page, machineId, railId);
    await page.getByLabel('Reading at hole 1 (thou)').fill('0');
    await page.getByLabel('Reading at hole 1 (thou)').press('Enter');
    await expect(page.getByTestId('progress')).toHaveText('1 of 5 holes fixed');

    await page.getByRole('button', { name: 'Abandon this bolt-down…' }).click();
    const dialog = page.getByRole('dialog', { name: 'Abandon this bolt-down?' });
    await expect(dialog).toContainText('1 of 5 holes are fixed');
    // No reason, no abandoning.
    await dialog.getByRole('button', { name: 'Abandon bolt-down' }).click();
    await expect(dialog.getByText('Say why, in at least 3 characters')).toBeVisible();
    await dialog.getByLabel('Why is it abandoned?').fill('Reference face has a burr; lifting the rail to clean it');
    await page.setViewportSize(PHONE);
    await snap(page, 'bolt-down-abandon-phone');
    await page.setViewportSize(TABLET);
    await dialog.getByRole('button', { name: 'Abandon bolt-down' }).click();
    await expect(dialog).toBeHidden();

    await expect(page.getByTestId('abandoned')).toContainText(
      'Reference face has a burr; lifting the rail to clean it',
    );
    await expect(page.getByTestId('abandoned')).toContainText('1 of 5 holes fixed');
    await expect(page.getByRole('button', { name: /Fix hole/ })).toHaveCount(0);
    await snap(page, 'bolt-down-abandoned-tablet');
    expect((await serverHoles(page.request, railId)).abandoned?.reason).toBe(
      'Reference face has a burr; lifting the rail to clean it',
    );

    await page.getByRole('button', { name: 'Begin a new bolt-down' }).click();
    // A negative band is refused under its field, and no bolt-down is begun.
    const begun: string[] = [];
    page.on('request', (r) => {
      if (r.method() === 'POST' && new URL(r.url()).pathname === `/api/rails/${railId}/bolt-downs`) begun.push(r.url());
    });
    const band = page.getByLabel('On-target band ± (thou)');
    await band.fill('-2');
    await page.getByRole('button', { name: 'Begin the bolt-down' }).click();
    await expect(band).toHaveAccessibleDescription('The band must be a number that is not negative');
    await expect(band).toHaveAttribute('aria-invalid', 'true');
    expect(begun).toEqual([]);
    await band.fill('');
    await expect(band).toHaveAccessibleDescription(
      "Empty: half the rail straightness target of the machine's target set",
    );
    await page.getByRole('button', { name: 'Begin the bolt-down' }).click();
    await expect(page.getByTestId('progress')).toHaveText('0 of 5 holes fixed');
    expect(begun).toHaveLength(1);
    await expect(page.getByTestId('abandoned')).toHaveCount(0);
    const list = (await (await page.request.get(`/api/rails/${railId}/bolt-downs`)).json()) as { abandoned: unknown }[];
    expect(list.map((b) => !!b.abandoned)).toEqual([false, true]);
  });
});
