import { expect, test, type Page } from '@playwright/test';
import { DEMO, signInAs, snap } from './support/session';

/**
 * At the machine with poor Wi-Fi: after one visit the app opens without a connection; answers
 * typed meanwhile wait on the device (a banner says how many), survive a reload, and are recorded
 * exactly once when the connection returns.
 */

async function newMachine(page: Page, name: string): Promise<string> {
  await signInAs(page, DEMO.owner);
  const res = await page.request.post('/api/machines', {
    data: { name, kind: 'router', workArea: { x: 900, y: 600 } },
  });
  expect(res.status()).toBe(201);
  const id = (await res.json()).id as string;
  await page.getByRole('button', { name: 'Sign out' }).click();
  await expect(page).toHaveURL(/sign-in/);
  return id;
}

async function openWalk(page: Page, machineId: string) {
  await page.goto(`/machines/${machineId}`);
  await page.getByRole('tab', { name: 'Safety walk' }).click();
  await expect(page.getByTestId('walk-counts')).toContainText('0 of');
  // The service worker has taken the page over: from now on the app opens without a connection.
  await page.waitForFunction(
    async () => !!(await navigator.serviceWorker.ready) && !!navigator.serviceWorker.controller,
  );
}

const item = (page: Page, words: RegExp) => page.getByRole('group', { name: words });

async function answersOf(page: Page, machineId: string): Promise<Record<string, string>> {
  const walk = (await (await page.request.get(`/api/machines/${machineId}/safety-walk`)).json()) as {
    sections: { items: { text: string; answer: { answer: string } | null }[] }[];
  };
  return Object.fromEntries(
    walk.sections
      .flatMap((s) => s.items)
      .filter((i) => i.answer)
      .map((i) => [i.text, i.answer!.answer]),
  );
}

test.describe('offline at the machine', () => {
  test('answers typed without a connection wait, survive a reload, and are recorded once when it returns', async ({
    page,
    context,
  }) => {
    const machineId = await newMachine(page, `Offline router ${Date.now()}`);
    await signInAs(page, DEMO.technician);
    await openWalk(page, machineId);
    // Every answer sent carries the key made when it was typed (the server records a key once).
    const keys: string[] = [];
    page.on('request', (r) => {
      if (r.method() === 'PUT' && r.url().includes('/safety-walk/items/')) keys.push(r.headers()['idempotency-key']);
    });

    await context.setOffline(true);
    await item(page, /licensed electrician/)
      .getByRole('button', { name: 'Yes' })
      .click();
    await expect(item(page, /licensed electrician/)).toContainText('Yes · Tamsin Hale');
    await expect(page.getByRole('status').filter({ hasText: 'Offline' })).toContainText(
      'Offline: 1 entry waiting on this device',
    );
    // Nothing greys out: a second answer is taken as well.
    await item(page, /extraction or ventilation/)
      .getByRole('button', { name: 'No', exact: true })
      .click();
    await expect(page.getByRole('status').filter({ hasText: 'Offline' })).toContainText(
      'Offline: 2 entries waiting on this device',
    );
    await snap(page, 'offline-waiting-desktop');

    // A reload without a connection opens the app (not the browser's error page), entries still waiting.
    await page.reload();
    await expect(page.getByRole('status').filter({ hasText: 'Offline' })).toContainText('2 entries waiting', {
      timeout: 15_000,
    });
    await expect(page.getByRole('button', { name: 'Sign out' })).toBeVisible();

    await context.setOffline(false);
    await expect(page.getByRole('status').filter({ hasText: /waiting|Sending/ })).toHaveCount(0, { timeout: 20_000 });
    const answers = await answersOf(page, machineId);
    expect(Object.values(answers).sort()).toEqual(['no', 'yes']);
    // Two entries, two keys, whatever the number of sendings.
    expect(keys.every((k) => /^[0-9a-f-]{36}$/.test(k))).toBe(true);
    expect(new Set(keys).size).toBe(2);
  });

  test('an entry waiting on the device is never sent under another person’s sign-in', async ({ page, context }) => {
    const machineId = await newMachine(page, `Shared tablet ${Date.now()}`);
    await signInAs(page, DEMO.technician);
    await openWalk(page, machineId);
    await context.setOffline(true);
    await item(page, /licensed electrician/)
      .getByRole('button', { name: 'Yes' })
      .click();
    await expect(page.getByRole('status').filter({ hasText: 'Offline' })).toContainText(
      'Offline: 1 entry waiting on this device',
    );

    // The technician's session ends while the entry waits (as after an expiry on the server),
    // and the builder signs in on the same tablet once the connection is back.
    await context.clearCookies();
    await context.setOffline(false);
    await page.goto('/sign-in');
    await signInAs(page, DEMO.builder);
    await expect(
      page.getByText(/1 entry typed on this device by Tamsin Hale waits until its author signs in here again/),
    ).toBeVisible({ timeout: 15_000 });
    await page.waitForTimeout(1500);
    expect(await answersOf(page, machineId)).toEqual({});
    await snap(page, 'offline-waiting-for-author');

    // Back under the technician's own sign-in it goes out, once.
    await page.getByRole('button', { name: 'Sign out' }).click();
    await expect(page).toHaveURL(/sign-in/);
    await signInAs(page, DEMO.technician);
    await expect
      .poll(async () => Object.values(await answersOf(page, machineId)), { timeout: 20_000 })
      .toEqual(['yes']);
    await expect(page.getByText(/typed on this device by/)).toHaveCount(0);
  });

  test('a machine file reloaded without a connection opens on its readiness as last seen', async ({
    page,
    context,
  }) => {
    await signInAs(page, DEMO.builder);
    const machines = (await (await page.request.get('/api/machines')).json()) as { id: string; name: string }[];
    const { id: machineId, name } = machines[0];
    await page.goto(`/machines/${machineId}`);
    const counts = page.getByText(/within target · \d+ waived/);
    await expect(counts).toBeVisible();
    const seen = await counts.textContent();
    await page.waitForFunction(
      async () => !!(await navigator.serviceWorker.ready) && !!navigator.serviceWorker.controller,
    );
    // The pages' answers are kept on the device (IndexedDB) at most once a second: wait until the
    // machine and its readiness are in what was kept.
    await page.waitForFunction(async (id) => {
      const db = await new Promise<IDBDatabase>((resolve, reject) => {
        const open = indexedDB.open('keyval-store');
        open.onsuccess = () => resolve(open.result);
        open.onerror = () => reject(open.error);
      });
      const kept = await new Promise<{ clientState?: { queries?: { queryKey: unknown[] }[] } } | undefined>(
        (resolve) => {
          const read = db.transaction('keyval').objectStore('keyval').get('railwright.pages.v1');
          read.onsuccess = () => resolve(read.result);
          read.onerror = () => resolve(undefined);
        },
      );
      db.close();
      const keys = (kept?.clientState?.queries ?? []).map((q) => JSON.stringify(q.queryKey));
      const ofMachine = keys.filter((k) => k.includes(id));
      return ofMachine.some((k) => k.startsWith('["machines"')) && ofMachine.some((k) => k.includes('readiness'));
    }, machineId);
    await context.setOffline(true);
    await page.reload();
    await expect(page.getByRole('heading', { name })).toBeVisible();
    await expect(page.getByText(seen!)).toBeVisible();
    await expect(page.getByText('Gathering the checks…')).toHaveCount(0);
    await context.setOffline(false);
  });

  test('signing out needs the connection: without one the person stays signed in and is told so', async ({
    page,
    context,
  }) => {
    await signInAs(page, DEMO.viewer);
    await page.waitForFunction(async () => !!(await navigator.serviceWorker.ready));
    await context.setOffline(true);
    await page.getByRole('button', { name: 'Sign out' }).click();
    await expect(page.getByRole('alert').filter({ hasText: 'signing out needs the connection' })).toBeVisible();
    await expect(page.getByRole('button', { name: 'Sign out' })).toBeVisible();
    await context.setOffline(false);
    await page.getByRole('button', { name: 'Sign out' }).click();
    await expect(page).toHaveURL(/sign-in/);
  });
});
