import { expect, test, type APIRequestContext, type Page } from '@playwright/test';
import path from 'node:path';
import { DEMO, signInAs } from './support/session';

const shot = (name: string) => path.join(__dirname, 'screenshots', `${name}.png`);
const TABLET = { width: 820, height: 1180 };
const PHONE = { width: 390, height: 844 };

/** A new machine file with one rail, made through the API as the signed-in person. */
async function newRail(
  request: APIRequestContext,
  rail: { lengthMm: number; holePitchMm: number; firstHoleMm: number },
) {
  const machine = await request.post('/api/machines', {
    data: { name: `Indicator test ${Date.now()}`, kind: 'plasma', workArea: { x: 3000, y: 1500 } },
  });
  expect(machine.status()).toBe(201);
  const machineId = (await machine.json()).id as string;
  const made = await request.post(`/api/machines/${machineId}/rails`, {
    data: {
      label: 'Y1 (left)',
      axis: 'Y1',
      profileSize: 20,
      lengthUnit: 'mm',
      length: rail.lengthMm,
      holePitch: rail.holePitchMm,
      firstHole: rail.firstHoleMm,
    },
  });
  expect(made.status()).toBe(201);
  return { machineId, railId: (await made.json()).id as string };
}

/** A USB indicator in keyboard mode: the reading's keys and Enter, milliseconds apart. */
async function indicatorSends(page: Page, reading: string) {
  await page.keyboard.type(reading);
  await page.keyboard.press('Enter');
}

const arrived = (page: Page) => page.getByRole('status', { name: 'Last reading' });
const reading = (page: Page, positionMm: number) => page.getByLabel(`Reading at ${positionMm} mm`);

/**
 * The next reading comes once the carriage has moved to the next station: by then the live chart
 * has drawn. (Simulated keys carry the time they were sent from here, so a chart drawing between
 * two of them would stretch the burst; a real indicator's keys carry the time they were typed.)
 */
async function settle(page: Page) {
  await page.waitForTimeout(300);
  await page.waitForLoadState('networkidle');
  await page.evaluate(() => new Promise((done) => requestAnimationFrame(() => requestAnimationFrame(done))));
}

/** Takes the focus off every field, as when the builder has put the tablet down. */
const blur = (page: Page) => page.evaluate(() => (document.activeElement as HTMLElement | null)?.blur());

async function openSweep(page: Page) {
  // 600 mm rail, holes every 100 mm from 50 mm: stations at 50, 150 … 550 mm.
  const { machineId, railId } = await newRail(page.request, { lengthMm: 600, holePitchMm: 100, firstHoleMm: 50 });
  await page.goto(`/machines/${machineId}/rails/${railId}`);
  await expect(reading(page, 550)).toBeVisible();
  return railId;
}

test.describe('indicator input', () => {
  test('a keyboard-mode indicator fills a sweep station by station, whatever its decimal style or sign, and the sweep saves them', async ({
    page,
  }) => {
    await signInAs(page, DEMO.builder);
    const railId = await openSweep(page);

    // Typed into the first station: each reading lands where it was sent and the focus moves on.
    await reading(page, 50).click();
    await indicatorSends(page, '0,012');
    await indicatorSends(page, '-0.004');
    await indicatorSends(page, '+0.010');
    await expect(reading(page, 50)).toHaveValue('0.012');
    await expect(reading(page, 150)).toHaveValue('-0.004');
    // The reading as sent, trailing zero kept (it tells the resolution), without the plus.
    await expect(reading(page, 250)).toHaveValue('0.010');
    await expect(reading(page, 350)).toBeFocused();
    await expect(arrived(page)).toContainText('0.010 thou → station 3 at 250 mm');

    // "From an indicator": with no field selected, a burst fills the next station without a reading.
    await page.getByLabel('From an indicator').check();
    await blur(page);
    await settle(page);
    await indicatorSends(page, '- 0,002');
    await expect(reading(page, 350)).toHaveValue('-0.002');
    await expect(arrived(page)).toContainText('-0.002 thou → station 4 at 350 mm');
    // A reading sent in another unit is converted to the sweep's (0.0254 mm is 1 thou).
    await settle(page);
    await indicatorSends(page, '0.0254 mm');
    await expect(reading(page, 450)).toHaveValue('1');
    await expect(arrived(page)).toContainText('1 thou → station 5 at 450 mm');
    await expect(arrived(page)).toContainText('Sent as 0.0254 mm');

    // Taken back: the station is empty again and the next reading goes there.
    await arrived(page).getByRole('button', { name: 'Undo' }).click();
    await expect(reading(page, 450)).toHaveValue('');
    await expect(arrived(page)).toHaveCount(0);
    await settle(page);
    await indicatorSends(page, '0.8');
    await expect(reading(page, 450)).toHaveValue('0.8');

    // Something that is not a reading fills nothing and says why.
    await settle(page);
    await indicatorSends(page, '12abc');
    await expect(page.getByRole('alert').filter({ hasText: '“12abc” is not a reading' })).toBeVisible();
    await expect(reading(page, 550)).toHaveValue('');
    // A person typing at a person's pace is not an indicator: nothing is captured.
    await settle(page);
    await page.keyboard.type('0.7', { delay: 120 });
    await page.keyboard.press('Enter');
    await expect(reading(page, 550)).toHaveValue('');

    await settle(page);
    await indicatorSends(page, '0.3');
    await expect(reading(page, 550)).toHaveValue('0.3');
    await page.getByRole('button', { name: 'Save sweep' }).click();
    await expect(page.getByRole('region', { name: 'Sweep saved' })).toBeVisible();
    const sweeps = await (await page.request.get(`/api/rails/${railId}/sweeps`)).json();
    const saved = (Array.isArray(sweeps) ? sweeps : sweeps.items)[0];
    const full = await (await page.request.get(`/api/sweeps/${saved.id}`)).json();
    expect(full.readingUnit).toBe('thou');
    expect(full.lengthUnit).toBe('mm');
    expect(full.stations).toEqual(
      [
        { position: 50, reading: 0.012 },
        { position: 150, reading: -0.004 },
        { position: 250, reading: 0.01 },
        { position: 350, reading: -0.002 },
        { position: 450, reading: 0.8 },
        { position: 550, reading: 0.3 },
      ].map((s) => expect.objectContaining(s)),
    );
  });

  test('indicator readings fill two bolt-down holes without fixing them; the builder fixes each', async ({ page }) => {
    await signInAs(page, DEMO.builder);
    // 300 mm rail, holes every 60 mm from 30 mm: fixed in the order 1, 5, 3, 2, 4.
    const { machineId, railId } = await newRail(page.request, { lengthMm: 300, holePitchMm: 60, firstHoleMm: 30 });
    await page.goto(`/machines/${machineId}/rails/${railId}/bolt-down`);
    await page.getByRole('radio', { name: /Line mode/ }).check();
    await page.getByRole('button', { name: 'Begin the bolt-down' }).click();
    const progress = page.getByTestId('progress');
    await expect(progress).toHaveText(/0 of 5 holes fixed/);
    const fixedOnServer = async () => {
      const bd = (await (await page.request.get(`/api/rails/${railId}/bolt-downs`)).json())[0];
      const full = await (await page.request.get(`/api/bolt-downs/${bd.id}`)).json();
      return (full.holes as { fixed: boolean }[]).filter((h) => h.fixed).length;
    };

    // The reading field has the focus: the indicator's reading and Enter fill it, nothing more.
    await expect(page.getByLabel('Reading at hole 1 (thou)')).toBeFocused();
    // The carriage reaches hole 1 once the page has drawn the new bolt-down (see settle).
    await settle(page);
    await indicatorSends(page, '0,5');
    await expect(page.getByLabel('Reading at hole 1 (thou)')).toHaveValue('0.5');
    await expect(arrived(page)).toContainText('0.5 thou → hole 1 at 30 mm, not fixed yet');
    await expect(page.getByRole('heading', { name: 'Hole 1', exact: true })).toBeVisible();
    await expect(progress).toHaveText('0 of 5 holes fixed');
    expect(await fixedOnServer()).toBe(0);
    await page.setViewportSize(TABLET);
    await page.getByRole('form', { name: 'Fixing Hole 1' }).screenshot({ path: shot('indicator-bolt-down-tablet') });
    await page.getByRole('button', { name: 'Fix hole 1' }).click();
    await expect(progress).toHaveText('1 of 5 holes fixed');
    // The fix is shown at once and recorded just after; once it is (the page has read the server's
    // answer and drawn it), the next reading comes, as it would once the carriage is at hole 5.
    await expect(page.getByRole('row', { name: 'Hole 1', exact: true })).toContainText(/Fixed$/);

    // The far end, from a negative reading: filled, aimed against, still not fixed.
    await expect(page.getByRole('heading', { name: 'Hole 5', exact: true })).toBeVisible();
    await expect(page.getByLabel('Reading at hole 5 (thou)')).toBeFocused();
    await settle(page);
    await indicatorSends(page, '-0.4');
    await expect(page.getByLabel('Reading at hole 5 (thou)')).toHaveValue('-0.4');
    await expect(page.getByTestId('difference')).toHaveText('−0.9 thou');
    await expect(progress).toHaveText('1 of 5 holes fixed');
    await expect.poll(fixedOnServer).toBe(1);
    await page.getByRole('button', { name: 'Fix hole 5' }).click();
    await expect(progress).toHaveText('2 of 5 holes fixed');
    // The fix is shown at once and sent as an entry of the device's queue: it reaches the server just after.
    await expect.poll(fixedOnServer).toBe(2);
  });

  test('a serial indicator fills a sweep line by line, and a reading can be taken back', async ({ page }) => {
    // A stand-in for Web Serial: the port picker returns a port whose stream yields what the test pushes.
    await page.addInitScript(() => {
      const w = window as unknown as { serialPush: (t: string) => void; serialBaud: number };
      const readable = new ReadableStream<Uint8Array>({
        start(controller) {
          w.serialPush = (t: string) => controller.enqueue(new TextEncoder().encode(t));
        },
      });
      const port = {
        readable,
        open: async (o: { baudRate: number }) => {
          w.serialBaud = o.baudRate;
        },
        close: async () => {},
      };
      Object.defineProperty(Navigator.prototype, 'serial', {
        configurable: true,
        get: () => ({ requestPort: async () => port }),
      });
    });
    const push = (text: string) =>
      page.evaluate((t) => (window as unknown as { serialPush: (t: string) => void }).serialPush(t), text);

    await signInAs(page, DEMO.builder);
    const railId = await openSweep(page);
    await page.getByRole('button', { name: 'Serial cable…' }).click();
    await page.getByRole('button', { name: 'Connect a serial indicator' }).click();
    await expect(page.getByText('Connected: each line fills the next empty cell.')).toBeVisible();
    expect(await page.evaluate(() => (window as unknown as { serialBaud: number }).serialBaud)).toBe(9600);

    // Two lines in one chunk land in two stations, in order.
    await push('0.010\r\n-0.002\r\n');
    await expect(reading(page, 50)).toHaveValue('0.010');
    await expect(reading(page, 150)).toHaveValue('-0.002');
    await expect(arrived(page)).toContainText('-0.002 thou → station 2 at 150 mm');

    // Undo clears station 2; the next line goes there again.
    await arrived(page).getByRole('button', { name: 'Undo' }).click();
    await expect(reading(page, 150)).toHaveValue('');
    await push('-0,003\r\n');
    await expect(reading(page, 150)).toHaveValue('-0.003');
    // A line split over two chunks still reads as one.
    await push('+0.0');
    await push('07\r\n');
    await expect(reading(page, 250)).toHaveValue('0.007');
    await push('E-12\r\n');
    await expect(page.getByRole('alert').filter({ hasText: '“E-12” is not a reading' })).toBeVisible();
    await expect(reading(page, 350)).toHaveValue('');
    await push('0.004\r\n');
    await expect(reading(page, 350)).toHaveValue('0.004');
    await expect(arrived(page)).toContainText('0.004 thou → station 4 at 350 mm');

    const sweepForm = page.getByRole('region', { name: 'New sweep' });
    await page.setViewportSize(TABLET);
    await sweepForm.screenshot({ path: shot('indicator-sweep-tablet') });
    await page.setViewportSize(PHONE);
    await sweepForm.screenshot({ path: shot('indicator-sweep-phone') });
    // Undo is a full-size touch target on a phone.
    const undo = await arrived(page).getByRole('button', { name: 'Undo' }).boundingBox();
    expect(undo!.height).toBeGreaterThanOrEqual(44);
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(PHONE.width);

    await page.getByRole('button', { name: 'Save sweep' }).click();
    await expect(page.getByRole('region', { name: 'Sweep saved' })).toBeVisible();
    const sweeps = await (await page.request.get(`/api/rails/${railId}/sweeps`)).json();
    const saved = (Array.isArray(sweeps) ? sweeps : sweeps.items)[0];
    const full = await (await page.request.get(`/api/sweeps/${saved.id}`)).json();
    expect(full.stations.map((s: { reading: number }) => s.reading)).toEqual([0.01, -0.003, 0.007, 0.004]);
  });

  test('in the bed grid a reading lands in the selected cell and moves on; Undo goes back to that cell', async ({
    page,
  }) => {
    await signInAs(page, DEMO.technician);
    await page.goto('/machines');
    await page.getByRole('link', { name: 'Big plasma table' }).click();
    await page.getByRole('tab', { name: 'Frame' }).click();
    const grid = page.getByRole('form', { name: 'Bed grid' });
    const cell = (r: number, c: number) => grid.getByLabel(`Height at row ${r}, column ${c}`);
    await cell(1, 1).click();
    await indicatorSends(page, '0,10');
    await indicatorSends(page, '-0.05');
    await expect(cell(1, 1)).toHaveValue('0.10');
    await expect(cell(1, 2)).toHaveValue('-0.05');
    await expect(cell(1, 3)).toBeFocused();
    await expect(arrived(page)).toContainText('-0.05 mm → row 1, column 2');
    await arrived(page).getByRole('button', { name: 'Undo' }).click();
    await expect(cell(1, 2)).toHaveValue('');
    await expect(cell(1, 2)).toBeFocused();
    await indicatorSends(page, '0.02');
    await expect(cell(1, 2)).toHaveValue('0.02');
    await expect(cell(1, 3)).toBeFocused();
  });

  test('without Web Serial the page says so and keyboard mode still works', async ({ page }) => {
    await page.addInitScript(() => {
      delete (Navigator.prototype as unknown as { serial?: unknown }).serial;
    });
    await signInAs(page, DEMO.builder);
    await openSweep(page);
    await page.getByRole('button', { name: 'Serial cable…' }).click();
    await expect(
      page.getByText('not available in this browser (use Chrome or Edge on a computer, or keyboard mode)'),
    ).toBeVisible();
    await reading(page, 50).click();
    await indicatorSends(page, '-0,25');
    await expect(reading(page, 50)).toHaveValue('-0.25');
  });
});
