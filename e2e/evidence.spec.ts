import { expect, test, type APIRequestContext, type Page } from '@playwright/test';
import { randomBytes } from 'node:crypto';
import sharp from 'sharp';
import { DEMO, signInAs, snap } from './support/session';

const TABLET = { width: 820, height: 1180 };

/** A photo-like PNG of random pixels: it does not compress, so it takes a while on a slow link. */
async function noisyPng(width: number, height: number): Promise<Buffer> {
  return sharp(randomBytes(width * height * 3), { raw: { width, height, channels: 3 } })
    .png()
    .toBuffer();
}

/** A picture with something in it, so a screenshot shows whether thumbnails are cut sensibly. */
async function railPhoto(): Promise<Buffer> {
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="1200" height="900">
    <rect width="1200" height="900" fill="#6f7d7a"/>
    <rect x="80" y="380" width="1040" height="90" fill="#c9cfcd"/>
    <rect x="80" y="470" width="1040" height="30" fill="#3c4543"/>
    <rect x="420" y="300" width="240" height="90" rx="10" fill="#2b3331"/>
    <circle cx="560" cy="200" r="110" fill="#f6f4ef" stroke="#1e2624" stroke-width="14"/>
    <line x1="560" y1="200" x2="620" y2="130" stroke="#b3261e" stroke-width="8"/>
    <rect x="545" y="300" width="30" height="80" fill="#1e2624"/>
  </svg>`;
  return sharp(Buffer.from(svg)).jpeg({ quality: 85 }).toBuffer();
}

async function newMachine(request: APIRequestContext, name: string) {
  const res = await request.post('/api/machines', { data: { name, kind: 'plasma', workArea: { x: 3000, y: 1500 } } });
  expect(res.status()).toBe(201);
  return (await res.json()).id as string;
}

async function attach(
  request: APIRequestContext,
  machineId: string,
  name: string,
  buffer: Buffer,
  mimeType: string,
  caption = '',
) {
  const res = await request.post('/api/evidence', {
    multipart: { subjectType: 'machine', subjectId: machineId, caption, file: { name, mimeType, buffer } },
  });
  expect(res.status()).toBe(201);
}

/** The dialog fades in; a screenshot taken before the end shows the page through it. */
async function settled(page: Page) {
  await expect(page.locator('.MuiDialog-container')).toHaveCSS('opacity', '1');
}

/** Resolves once the device keeps the signed-in person (IndexedDB, lib/offline/persister.ts). */
async function signInKept(page: Page) {
  await page.waitForFunction(
    () =>
      new Promise<boolean>((resolve) => {
        const open = indexedDB.open('keyval-store');
        open.onerror = () => resolve(false);
        open.onsuccess = () => {
          const db = open.result;
          if (!db.objectStoreNames.contains('keyval')) return resolve(false);
          const get = db.transaction('keyval', 'readonly').objectStore('keyval').get('railwright.cache.v1');
          get.onerror = () => resolve(false);
          get.onsuccess = () =>
            resolve(
              JSON.stringify(
                get.result?.clientState?.queries?.map((q: { state: { data: unknown } }) => q.state.data) ?? [],
              ).includes('"role"'),
            );
        };
      }),
    undefined,
    { polling: 100 },
  );
}

async function openEvidence(page: Page, machineId: string) {
  await page.goto(`/machines/${machineId}?tab=evidence`);
  await expect(page.getByRole('tab', { name: 'Evidence', selected: true })).toBeVisible();
}

test.describe('evidence: photos and files', () => {
  test('a builder uploads several files with a progress bar each, sees the photo in the gallery and opens it full size', async ({
    page,
  }) => {
    await signInAs(page, DEMO.builder);
    const machineId = await newMachine(page.request, `Evidence table ${Date.now()}`);
    await openEvidence(page, machineId);
    await expect(page.getByText('No evidence yet')).toBeVisible();

    // A slow link (about 150 kB/s up) so the progress bar can be seen moving.
    const cdp = await page.context().newCDPSession(page);
    await cdp.send('Network.enable');
    await cdp.send('Network.emulateNetworkConditions', {
      offline: false,
      latency: 20,
      downloadThroughput: -1,
      uploadThroughput: 150 * 1024,
    });

    const photo = await noisyPng(360, 300);
    const elf = Buffer.concat([Buffer.from([0x7f, 0x45, 0x4c, 0x46, 2, 1, 1, 0]), Buffer.alloc(2048, 0x90)]);
    await page.getByLabel('Caption (optional)').fill('Y1 rail against the straight edge');
    await page.getByLabel('Choose photos or files').setInputFiles([
      { name: 'rail-setup.png', mimeType: 'image/png', buffer: photo },
      { name: 'sweep-y1.csv', mimeType: 'text/csv', buffer: Buffer.from('station_mm,reading_thou\n0,0\n250,0.6\n') },
      { name: 'photo.jpg', mimeType: 'image/jpeg', buffer: elf },
    ]);

    const bar = page.getByRole('progressbar', { name: 'Upload of rail-setup.png' });
    await expect(bar).toBeVisible();
    // Part of the way: neither nothing nor everything sent yet.
    await expect(bar).toHaveAttribute('aria-valuenow', /^([1-9]|[1-9][0-9])$/, { timeout: 15_000 });
    await snap(page, 'evidence-uploading-desktop');

    // The renamed program is refused with its own message; the others are attached.
    await expect(page.getByRole('alert').filter({ hasText: 'photo.jpg is a program (ELF)' })).toBeVisible();
    await cdp.send('Network.emulateNetworkConditions', {
      offline: false,
      latency: 0,
      downloadThroughput: -1,
      uploadThroughput: -1,
    });
    await expect(bar).toHaveAttribute('aria-valuenow', '100', { timeout: 30_000 });
    await expect(page.getByRole('list', { name: 'Uploads' }).getByText(/^Attached/)).toHaveCount(2);

    const thumb = page.getByRole('button', { name: 'View rail-setup.png full size' });
    await expect(thumb).toBeVisible();
    await expect(page.getByRole('list', { name: /^Files:/ }).getByRole('link', { name: 'sweep-y1.csv' })).toBeVisible();
    const thumbLoaded = await thumb
      .locator('img')
      .evaluate((img: HTMLImageElement) => img.decode().then(() => img.naturalWidth));
    expect(thumbLoaded).toBeGreaterThan(0);
    expect(thumbLoaded).toBeLessThanOrEqual(320);
    await snap(page, 'evidence-gallery-desktop');

    await thumb.click();
    const dialog = page.getByRole('dialog');
    await expect(dialog.getByText('Y1 rail against the straight edge')).toBeVisible();
    const full = dialog.getByRole('img', { name: /^Full size:/ });
    const width = await full.evaluate((img: HTMLImageElement) => img.decode().then(() => img.naturalWidth));
    expect(width).toBe(360);
    await expect(dialog.getByText('360 × 300 px')).toBeVisible();
    await settled(page);
    await snap(page, 'evidence-viewer-desktop');
    await dialog.getByRole('button', { name: 'Close' }).click();
    await expect(dialog).toBeHidden();
  });

  test('drops files on the drop zone', async ({ page }) => {
    await signInAs(page, DEMO.technician);
    // The sign-in is kept on the device a moment after it happens; a page opened before that
    // starts from the sign-in kept before (none), goes by the sign-in page and comes back, and a
    // drop made meanwhile lands on a drop zone that is about to be replaced.
    await signInKept(page);
    const machineId = await newMachine(page.request, `Drop table ${Date.now()}`);
    await openEvidence(page, machineId);
    await expect(page.getByText('No evidence yet')).toBeVisible();
    // A caption longer than the server takes is cut at 500 characters as it is typed, and goes with the drop.
    const caption = `Dropped at the Y2 end ${'·'.repeat(510)}`.slice(0, 500);
    await page.getByLabel('Caption (optional)').fill(`${caption}, and more`);
    await expect(page.getByLabel('Caption (optional)')).toHaveValue(caption);
    const jpeg = (await railPhoto()).toString('base64');
    const data = await page.evaluateHandle((b64) => {
      const bytes = Uint8Array.from(atob(b64), (c) => c.charCodeAt(0));
      const dt = new DataTransfer();
      dt.items.add(new File([bytes], 'dropped.jpg', { type: 'image/jpeg' }));
      return dt;
    }, jpeg);
    await page
      .getByRole('group', { name: 'Attach photos or files to this machine' })
      .dispatchEvent('drop', { dataTransfer: data });
    await expect(page.getByRole('list', { name: 'Uploads' }).getByText('dropped.jpg')).toBeVisible();
    await expect(page.getByRole('button', { name: 'View dropped.jpg full size' })).toBeVisible();
    const listed = await (await page.request.get(`/api/evidence?subjectType=machine&subjectId=${machineId}`)).json();
    expect(listed.map((e: { caption: string | null }) => e.caption)).toEqual([caption]);
  });

  test('at tablet size: the gallery, the full-size view, and delete for what you attached', async ({ page }) => {
    await page.setViewportSize(TABLET);
    await signInAs(page, DEMO.builder);
    const machineId = await newMachine(page.request, `Tablet table ${Date.now()}`);
    await attach(
      page.request,
      machineId,
      'indicator-on-carriage.jpg',
      await railPhoto(),
      'image/jpeg',
      'Indicator on the X carriage',
    );
    await attach(page.request, machineId, 'gantry.png', await noisyPng(200, 150), 'image/png');
    await attach(
      page.request,
      machineId,
      'screw-datasheet.pdf',
      Buffer.from('%PDF-1.4\n%%EOF\n'),
      'application/pdf',
      'Ball screw data',
    );
    await openEvidence(page, machineId);
    await expect(page.getByRole('region', { name: /^Evidence: Tablet table/ })).toContainText('2 photos, 1 file');
    await snap(page, 'evidence-gallery-tablet');

    await page.getByRole('button', { name: 'View indicator-on-carriage.jpg full size' }).click();
    const dialog = page.getByRole('dialog');
    const fullImage = dialog.getByRole('img', { name: 'Full size: Indicator on the X carriage' });
    await expect(fullImage).toBeVisible();
    await fullImage.evaluate((img: HTMLImageElement) => img.decode());
    await settled(page);
    await snap(page, 'evidence-viewer-tablet');
    await dialog.getByRole('button', { name: 'Next' }).click();
    await expect(dialog.getByRole('img', { name: 'Full size: gantry.png' })).toBeVisible();
    await dialog.getByRole('button', { name: 'Close' }).click();

    await page.getByRole('button', { name: 'Delete gantry.png' }).click();
    await page.getByRole('dialog').getByRole('button', { name: 'Delete' }).click();
    await expect(page.getByRole('button', { name: 'View gantry.png full size' })).toHaveCount(0);
    await expect(page.getByRole('region', { name: /^Evidence: Tablet table/ })).toContainText('1 photo, 1 file');
  });

  test("the demo plasma table's evidence is grouped by what it is attached to", async ({ page }) => {
    await signInAs(page, DEMO.owner);
    await page.goto('/machines');
    await page.getByRole('link', { name: 'Big plasma table' }).click();
    await page.getByRole('tab', { name: 'Evidence' }).click();
    const machine = page.getByRole('region', { name: 'Evidence: Big plasma table' });
    await expect(machine).toContainText('2 photos');
    const rail = page.getByRole('region', { name: /^Evidence: .*Y1/ });
    await expect(rail).toContainText('1 photo, 1 file');
    await expect(rail.getByRole('link', { name: 'y1-as-found.csv' })).toBeVisible();
    for (const img of await page.getByRole('img').all()) await img.evaluate((i: HTMLImageElement) => i.decode());
    await snap(page, 'evidence-demo-desktop');
  });

  test("the approved router's photos are kept: no delete, even for the owner", async ({ page }) => {
    await signInAs(page, DEMO.owner);
    await page.goto('/machines');
    await page.getByRole('link', { name: 'Small router' }).click();
    await page.getByRole('tab', { name: 'Evidence' }).click();
    await expect(page.getByRole('button', { name: 'View router-y1-sweep.jpg full size' })).toBeVisible();
    await expect(
      page
        .getByRole('list', { name: /^Photos: Sweep of rail Y1/ })
        .getByLabel('Kept: part of what an approval stands on'),
    ).toBeVisible();
    await expect(page.getByRole('button', { name: 'Delete router-y1-sweep.jpg' })).toHaveCount(0);
    // While the approval stands the machine file itself is part of what was signed: its photos are kept too.
    await expect(
      page.getByRole('list', { name: /^Photos: Small router/ }).getByLabel('Kept: part of what an approval stands on'),
    ).toBeVisible();
    await expect(page.getByRole('button', { name: 'Delete router-frame.jpg' })).toHaveCount(0);
    await snap(page, 'evidence-locked-desktop');
  });

  test('a viewer sees the evidence but no upload and no delete', async ({ page, browser }) => {
    const builder = await browser.newPage();
    await signInAs(builder, DEMO.builder);
    const machineId = await newMachine(builder.request, `Viewer table ${Date.now()}`);
    await attach(builder.request, machineId, 'frame.jpg', await railPhoto(), 'image/jpeg');
    await builder.close();

    await signInAs(page, DEMO.viewer);
    await openEvidence(page, machineId);
    await expect(page.getByRole('button', { name: 'View frame.jpg full size' })).toBeVisible();
    await expect(page.getByRole('button', { name: 'Choose files' })).toHaveCount(0);
    await expect(page.getByRole('button', { name: 'Delete frame.jpg' })).toHaveCount(0);
  });
  test('a photo goes straight onto a rail from the rail page, and shows there and in the machine file', async ({
    page,
  }) => {
    await signInAs(page, DEMO.builder);
    const machineId = await newMachine(page.request, `Rail photo table ${Date.now()}`);
    const rail = await page.request.post(`/api/machines/${machineId}/rails`, {
      data: { label: 'Y1 (left)', axis: 'Y1', lengthUnit: 'mm', length: 600, holePitch: 60, firstHole: 30 },
    });
    expect(rail.status()).toBe(201);
    const railId = (await rail.json()).id as string;
    await page.goto(`/machines/${machineId}/rails/${railId}`);
    const panel = page.getByRole('region', { name: 'Photos and files of this rail' });
    await panel
      .getByLabel('Choose photos or files')
      .setInputFiles([{ name: 'indicator-on-y1.jpg', mimeType: 'image/jpeg', buffer: await railPhoto() }]);
    await expect(panel.getByRole('button', { name: 'View indicator-on-y1.jpg full size' })).toBeVisible();
    const listed = await (await page.request.get(`/api/evidence?subjectType=rail&subjectId=${railId}`)).json();
    expect(listed.map((e: { fileName: string }) => e.fileName)).toContain('indicator-on-y1.jpg');
    await openEvidence(page, machineId);
    await expect(page.getByRole('button', { name: 'View indicator-on-y1.jpg full size' })).toBeVisible();
  });
});
