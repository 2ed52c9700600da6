import { expect, test, type Page } from '@playwright/test';
import { DEMO, signInAs, snap } from './support/session';

const TABLET = { width: 820, height: 1180 };

interface HistoryEntry {
  recordType: string;
  action: string;
  changes: { writeId?: string; hole?: number } | null;
}

const banner = (page: Page) => page.getByRole('status').filter({ hasText: /Offline|Sending/ });

/**
 * At the rail with the connection cut: two holes fixed and a sweep saved wait on the device (the
 * banner counts them), survive a reload, and each is recorded exactly once when it returns.
 */
test('bolt-down holes and a rail sweep typed offline are each recorded once when the connection returns', async ({
  page,
  context,
}) => {
  await signInAs(page, DEMO.builder);
  await page.setViewportSize(TABLET);
  const machine = await page.request.post('/api/machines', {
    data: { name: `Offline guide ${Date.now()}`, kind: 'plasma', workArea: { x: 3000, y: 1500 } },
  });
  const machineId = (await machine.json()).id as string;
  // 300 mm rail, holes every 60 mm from 30 mm: fixed in the order 1, 5, 3, 2, 4.
  const rail = await page.request.post(`/api/machines/${machineId}/rails`, {
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
  const railId = (await rail.json()).id as string;

  // The rail page first (its data stays in memory), then the guide, with one hole fixed online.
  await page.goto(`/machines/${machineId}/rails/${railId}`);
  await expect(page.getByLabel('Reading at 30 mm')).toBeVisible();
  await page.getByRole('link', { name: 'Bolt-down guide' }).click();
  await page.getByRole('button', { name: 'Begin the bolt-down' }).click();
  await page.getByLabel('Reading at hole 1 (thou)').fill('0');
  await page.getByLabel('Reading at hole 1 (thou)').press('Enter');
  await expect(page.getByTestId('progress')).toHaveText('1 of 5 holes fixed');
  const bd = (await (await page.request.get(`/api/rails/${railId}/bolt-downs`)).json())[0];
  await expect.poll(async () => (await (await page.request.get(`/api/bolt-downs/${bd.id}`)).json()).fixedCount).toBe(1);
  // Recorded, and the server's answer read back, before the connection is cut.
  await expect(page.getByRole('row', { name: 'Hole 1', exact: true })).toContainText(/Fixed$/);
  // The service worker has taken the page over: from now on the app opens without a connection.
  await page.waitForFunction(
    async () => !!(await navigator.serviceWorker.ready) && !!navigator.serviceWorker.controller,
  );

  const keys: string[] = [];
  page.on('request', (r) => {
    if (['PUT', 'POST'].includes(r.method()) && /\/api\/(bolt-downs|rails)\//.test(r.url()))
      keys.push(r.headers()['idempotency-key']);
  });
  await context.setOffline(true);

  // Two holes: the Fix button stays usable, the second is not dropped, each shows as waiting.
  await page.getByLabel('Reading at hole 5 (thou)').fill('0.5');
  await page.getByLabel('Reading at hole 5 (thou)').press('Enter');
  await expect(page.getByRole('row', { name: 'Hole 5', exact: true })).toContainText('Waiting to send');
  await expect(banner(page)).toContainText('Offline: 1 entry waiting on this device');
  // The aim of hole 3 follows the waiting hole 5, worked out on the device (line mode: halfway, +0.3 thou).
  await expect(page.getByTestId('aim')).toHaveText('+0.3 thou');
  await expect(page.getByRole('button', { name: 'Fix hole 3' })).toBeEnabled();
  await page.getByLabel('Reading at hole 3 (thou)').fill('0.25');
  await page.getByRole('button', { name: 'Fix hole 3' }).click();
  await expect(page.getByRole('row', { name: 'Hole 3', exact: true })).toContainText('Waiting to send');
  await expect(page.getByTestId('progress')).toHaveText('3 of 5 holes fixed');
  await expect(banner(page)).toContainText('Offline: 2 entries waiting on this device');
  await snap(page, 'bolt-down-offline-waiting-tablet');

  // A sweep of the rail, typed on its page (still in memory), waits too.
  await page.goBack();
  await page.getByLabel('Reading at 30 mm').click();
  for (const r of ['0', '0.5', '0.25', '0.5', '0']) {
    await page.keyboard.type(r);
    await page.keyboard.press('Enter');
  }
  await page.getByRole('button', { name: 'Save sweep' }).click();
  await expect(page.getByTestId('sweep-waiting')).toContainText(
    'Waiting to send: Sweep of rail Y1 (left) (5 readings)',
  );
  await expect(page.getByLabel('Reading at 30 mm')).toHaveValue('');
  await expect(banner(page)).toContainText('Offline: 3 entries waiting on this device');
  await snap(page, 'sweep-offline-waiting-tablet');

  // A reload without a connection opens the app, with the three entries still waiting.
  await page.reload();
  await expect(banner(page)).toContainText('3 entries waiting', { timeout: 15_000 });
  await expect(page.getByRole('button', { name: 'Sign out' })).toBeVisible();
  // The pages open again from what the device kept: the rail's sweep form, and the guide.
  await expect(page.getByLabel('Reading at 30 mm')).toBeVisible();
  await page.goForward();
  await expect(page.getByTestId('progress')).toContainText('of 5 holes fixed', { timeout: 15_000 });

  await context.setOffline(false);
  await expect(banner(page)).toHaveCount(0, { timeout: 30_000 });

  // On the server: each entry once.
  const state = await (await page.request.get(`/api/bolt-downs/${bd.id}`)).json();
  expect(
    Object.fromEntries(
      state.holes
        .filter((h: { fixed: boolean }) => h.fixed)
        .map((h: { index: number; reading: number }) => [h.index + 1, h.reading]),
    ),
  ).toEqual({ 1: 0, 5: 0.5, 3: 0.25 });
  const sweeps = await (await page.request.get(`/api/rails/${railId}/sweeps`)).json();
  expect(sweeps).toHaveLength(1);
  expect(sweeps[0].stationCount).toBe(5);
  const history: HistoryEntry[] = (
    await (await page.request.get(`/api/machines/${machineId}/history?limit=200`)).json()
  ).entries;
  expect(
    history
      .filter((e) => e.recordType === 'bolt-down' && e.action === 'updated')
      .map((e) => e.changes?.hole)
      .sort(),
  ).toEqual([0, 2, 4]);
  expect(history.filter((e) => e.recordType === 'rail-sweep')).toHaveLength(1);
  // Three entries, three keys, whatever the number of sendings.
  expect(keys.length).toBeGreaterThanOrEqual(3);
  expect(keys.every((k) => /^[0-9a-f-]{36}$/.test(k))).toBe(true);
  expect(new Set(keys).size).toBe(3);
});
