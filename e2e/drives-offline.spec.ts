import { expect, test, type Page } from '@playwright/test';
import sharp from 'sharp';
import { newAxis } from './support/machine-with-axis';
import { DEMO, signInAs, snap } from './support/session';

/**
 * At the machine without a connection: a travel trial, a diagonal check and a photo are kept on
 * the device (shown as waiting where they will land, the banner counting them), and each is
 * recorded exactly once when the connection returns.
 */

const listOf = (body: unknown) =>
  (Array.isArray(body) ? body : ((body as { items?: unknown[] }).items ?? [])) as unknown[];
const count = async (page: Page, path: string) => listOf(await (await page.request.get(path)).json()).length;
const banner = (page: Page) => page.getByRole('status').filter({ hasText: 'Offline' });

test('a travel trial, a diagonal check and a photo typed offline wait on the device and are recorded once when the connection returns', async ({
  page,
  context,
}) => {
  await signInAs(page, DEMO.technician);
  const { machineId, axisId } = await newAxis(page.request, `Offline entries ${Date.now()}`);
  const sent: Record<string, string[]> = {};
  page.on('request', (r) => {
    const key = r.headers()['idempotency-key'];
    if (r.method() === 'POST' && key) (sent[new URL(r.url()).pathname] ??= []).push(key);
  });

  // Each page visited once with the connection (what a page shows offline is what it last read).
  await page.goto(`/machines/${machineId}?tab=evidence`);
  await expect(page.getByText('No evidence yet')).toBeVisible();
  await page.getByRole('tab', { name: 'Frame' }).click();
  const form = page.getByRole('form', { name: 'Diagonal check' });
  await expect(form).toBeVisible();
  await page.getByRole('tab', { name: 'Drives' }).click();
  await page.getByRole('table', { name: 'Axes' }).getByRole('link', { name: 'X' }).click();
  await expect(page.getByRole('heading', { name: 'Axis X' })).toBeVisible();
  // The service worker has the app: its pages open without a connection.
  await page.waitForFunction(
    async () => !!(await navigator.serviceWorker.ready) && !!navigator.serviceWorker.controller,
  );

  await context.setOffline(true);
  await page.getByLabel('Commanded move 1', { exact: true }).fill('200');
  await page.getByLabel('Measured move 1', { exact: true }).fill('199.9');
  await page.getByLabel('Commanded move 2', { exact: true }).fill('600');
  await page.getByLabel('Measured move 2', { exact: true }).fill('599.7');
  await page.getByRole('button', { name: 'Record trial' }).click();
  await expect(banner(page)).toContainText('Offline: 1 entry waiting on this device');
  await expect(page.getByLabel('Entries waiting to be sent')).toContainText('Travel trial of axis X (2 moves)');
  // The grid is free for the next trial, never greyed out.
  await expect(page.getByLabel('Commanded move 1', { exact: true })).toHaveValue('');
  await snap(page, 'drives-offline-trial-waiting-desktop');

  await page.goBack();
  await page.getByRole('tab', { name: 'Frame' }).click();
  await form.getByLabel('X side').fill('800');
  await form.getByLabel('Y side').fill('500');
  await form.getByLabel(/^Diagonal 1/).fill('943.40');
  await form.getByLabel(/^Diagonal 2/).fill('943.60');
  await form.getByRole('button', { name: 'Record diagonal check' }).click();
  await expect(banner(page)).toContainText('Offline: 2 entries waiting on this device');
  await expect(form.getByLabel('Entries waiting to be sent')).toContainText('Diagonal check: 943.4 and 943.6 mm');
  await expect(form.getByLabel('X side')).toHaveValue('');
  await expect(form.getByRole('button', { name: 'Record diagonal check' })).toBeEnabled();

  await page.getByRole('tab', { name: 'Evidence' }).click();
  const photo = await sharp({ create: { width: 64, height: 48, channels: 3, background: '#6f7d7a' } })
    .jpeg()
    .toBuffer();
  await page
    .getByLabel('Choose photos or files')
    .setInputFiles({ name: 'gantry-offline.jpg', mimeType: 'image/jpeg', buffer: photo });
  const uploads = page.getByRole('list', { name: 'Uploads' });
  await expect(uploads).toContainText('Waiting to be sent');
  await expect(banner(page)).toContainText('Offline: 3 entries waiting on this device');
  await snap(page, 'evidence-offline-waiting-desktop');

  await context.setOffline(false);
  await expect(page.getByRole('status').filter({ hasText: /waiting|Sending/ })).toHaveCount(0, { timeout: 30_000 });
  await expect(page.getByRole('button', { name: 'View gantry-offline.jpg full size' })).toBeVisible();
  await expect(uploads).toContainText('Attached');

  // Each entry recorded once, however often it was sent, each under its own key.
  expect(await count(page, `/api/machines/${machineId}/diagonal-checks`)).toBe(1);
  expect(await count(page, `/api/axes/${axisId}/travel-trials`)).toBe(1);
  expect(await count(page, `/api/evidence?machineId=${machineId}`)).toBe(1);
  for (const path of [
    `/api/machines/${machineId}/diagonal-checks`,
    `/api/axes/${axisId}/travel-trials`,
    '/api/evidence',
  ]) {
    expect(new Set(sent[path] ?? []).size, path).toBe(1);
  }
});
