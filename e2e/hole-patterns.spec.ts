import { expect, test, type Page } from '@playwright/test';
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { DEMO, signInAs, snap } from './support/session';

// At 72 pixels per inch one pixel is one point: 100 mm = 100 / 25.4 · 72 = 283.46 px.
const BAR_100_MM_PX = (100 / 25.4) * 72;

/** Renders page 1 at 72 dpi as PNG (to look at) and as greyscale PGM (to measure). */
function renderFirstPage(pdf: Buffer, name: string): { png: string; width: number; height: number; grey: Uint8Array } {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'rw-template-'));
  const file = path.join(dir, `${name}.pdf`);
  writeFileSync(file, pdf);
  execFileSync('pdftoppm', [
    '-png',
    '-r',
    '72',
    '-f',
    '1',
    '-l',
    '1',
    '-singlefile',
    file,
    path.join(__dirname, 'screenshots', `template-${name}`),
  ]);
  execFileSync('pdftoppm', ['-gray', '-r', '72', '-f', '1', '-l', '1', '-singlefile', file, path.join(dir, 'page')]);
  const pgm = readFileSync(path.join(dir, 'page.pgm'));
  const header = /^P5\s+(\d+)\s+(\d+)\s+255\s/.exec(pgm.subarray(0, 40).toString('latin1'))!;
  return {
    png: path.join(__dirname, 'screenshots', `template-${name}.png`),
    width: Number(header[1]),
    height: Number(header[2]),
    grey: pgm.subarray(header[0].length),
  };
}

/**
 * The 100 mm bar measured on the rendered page: the first long horizontal line in the lower part
 * of the sheet is its baseline; 7 px above it only the bar's 0, 50 and 100 mm ticks have
 * ink, and the distance between the ink centroids of the first and last tick is the bar's length.
 */
function measureHundredMmBar(img: { width: number; height: number; grey: Uint8Array }): number {
  const ink = (x: number, y: number) => 255 - img.grey[y * img.width + x];
  // Scanning up from the page's foot: the first band of rows whose longest run of ink is about
  // 100 mm is the 4 in bar, the next band up is the 100 mm bar (a pattern's outline can be as
  // long, but it lies higher, in the drawing).
  const longest = (y: number) => {
    let run = 0;
    let most = 0;
    for (let x = 0; x < img.width; x++) {
      run = ink(x, y) > 40 ? run + 1 : 0;
      most = Math.max(most, run);
    }
    return most;
  };
  const bands: number[][] = [];
  let inBand = false;
  for (let y = img.height - 1; y > 0 && bands.length < 2; y--) {
    const bar = longest(y) > 270 && longest(y) < 300;
    if (bar && !inBand) bands.push([]);
    if (bar) bands[bands.length - 1].push(y);
    inBand = bar;
  }
  const baseline = bands.length === 2 ? Math.min(...bands[1]) : -1;
  expect(baseline).toBeGreaterThan(0);
  // Major ticks stand 3 mm (8.5 px) above the baseline, the others 1.6 mm (4.5 px).
  const row = baseline - 7;
  const blobs: number[] = [];
  let sum = 0;
  let weighted = 0;
  for (let x = 0; x < 330; x++) {
    const v = ink(x, row);
    if (v > 10) {
      sum += v;
      weighted += v * x;
    } else if (sum > 0) {
      blobs.push(weighted / sum + 0.5);
      sum = 0;
      weighted = 0;
    }
  }
  expect(blobs.length).toBe(3);
  return blobs[2] - blobs[0];
}

async function plasmaId(page: Page): Promise<string> {
  const machines = await (await page.request.get('/api/machines')).json();
  return machines.find((m: { name: string }) => m.name === 'Big plasma table').id;
}

test.describe('drilling templates', () => {
  test('a builder prints a rail’s and a bracket’s template from the demo; the 100 mm bar measures 283.46 px at 72 dpi', async ({
    page,
  }) => {
    await page.setViewportSize({ width: 1366, height: 900 });
    await signInAs(page, DEMO.builder);
    const machineId = await plasmaId(page);
    await page.goto(`/machines/${machineId}?tab=templates`);
    await expect(page.getByRole('heading', { name: 'Rail seats' })).toBeVisible();
    await expect(page.getByRole('img', { name: 'Drawing of Y1 motor bracket' })).toBeVisible();
    await snap(page, 'templates-tab-desktop');

    for (const [name, link] of [
      ['rail', page.getByRole('link', { name: /^Print template \(PDF\) of rail / }).first()],
      ['bracket', page.getByRole('link', { name: 'Print template (PDF) of Y1 motor bracket' })],
    ] as const) {
      const href = (await link.getAttribute('href'))!;
      const res = await page.request.get(href);
      expect(res.status()).toBe(200);
      expect(res.headers()['content-type']).toBe('application/pdf');
      const img = renderFirstPage(await res.body(), name);
      const measured = measureHundredMmBar(img);
      console.log(`${name}: 100 mm bar measures ${measured.toFixed(2)} px (expected ${BAR_100_MM_PX.toFixed(2)})`);
      expect(Math.abs(measured - BAR_100_MM_PX)).toBeLessThanOrEqual(1);
    }
  });

  test('the pattern page and the new-pattern dialog read well on a tablet and a phone', async ({ page }) => {
    await signInAs(page, DEMO.builder);
    const machineId = await plasmaId(page);
    for (const [label, width, height] of [
      ['tablet', 820, 1180],
      ['phone', 390, 844],
    ] as const) {
      await page.setViewportSize({ width, height });
      await page.goto(`/machines/${machineId}?tab=templates`);
      await expect(page.getByRole('heading', { name: 'Brackets and plates' })).toBeVisible();
      await snap(page, `templates-tab-${label}`);
      await page.getByRole('link', { name: 'Y1 motor bracket' }).first().click();
      await expect(page.getByRole('table', { name: 'Holes' }).getByRole('row')).toHaveCount(5);
      await snap(page, `hole-pattern-${label}`);
      await page.goto(`/machines/${machineId}?tab=templates`);
      await page.getByRole('button', { name: 'New pattern' }).click();
      const dialog = page.getByRole('dialog', { name: 'New hole pattern' });
      // Nothing to save until the pattern has a name.
      await expect(dialog.getByRole('button', { name: 'Save pattern' })).toBeDisabled();
      await dialog.getByLabel('Name').fill(`Z bearing plate ${label}`);
      await expect(dialog.getByText('4 holes')).toBeVisible();
      await dialog.getByRole('tab', { name: 'Grid' }).click();
      await dialog.getByLabel('Columns').fill('3');
      await expect(dialog.getByRole('alert')).toContainText('wholly inside');
      await dialog.getByLabel('Column pitch (mm)').fill('40');
      await expect(dialog.getByText('6 holes')).toBeVisible();
      await snap(page, `new-pattern-${label}`);
      await dialog.getByRole('button', { name: 'Save pattern' }).click();
      await expect(dialog).toBeHidden();
      await expect(page.getByRole('link', { name: `Z bearing plate ${label}`, exact: true })).toBeVisible();
    }
  });
  test('a pattern typed as a list of holes: a hole added takes the last diameter, one removed goes, and the edit dialog opens on what was saved', async ({
    page,
  }) => {
    await signInAs(page, DEMO.builder);
    const machine = await page.request.post('/api/machines', {
      data: { name: `Hole list ${Date.now()}`, kind: 'router', workArea: { x: 900, y: 600 } },
    });
    const machineId = (await machine.json()).id as string;
    await page.goto(`/machines/${machineId}?tab=templates`);
    await page.getByRole('button', { name: 'New pattern' }).click();
    const dialog = page.getByRole('dialog', { name: 'New hole pattern' });
    const save = dialog.getByRole('button', { name: 'Save pattern' });
    const field = (name: string) => dialog.getByLabel(name, { exact: true });
    await dialog.getByLabel('Name').fill('X carriage plate');
    await dialog.getByRole('tab', { name: 'List of holes' }).click();
    await expect(dialog.getByText('· 1 holes')).toBeVisible();
    await field('Ø 1 (mm)').fill('6.6');
    const addHole = dialog.getByRole('button', { name: 'Add hole' });
    await addHole.click();
    await expect(addHole).toBeFocused();
    await expect(field('Ø 2 (mm)')).toHaveValue('6.6');
    await expect(field('x 2 (mm)')).toHaveValue('');
    // A hole without its place: no drawing, nothing to save.
    await expect(dialog.getByText('Give a name and every number to see the holes.')).toBeVisible();
    await expect(save).toBeDisabled();
    await field('x 2 (mm)').fill('90');
    await field('y 2 (mm)').fill('70');
    await expect(dialog.getByText('· 2 holes')).toBeVisible();
    await expect(save).toBeEnabled();
    // The first hole removed: the second moves up, and the last one left cannot be removed.
    await dialog.getByRole('button', { name: 'Remove hole 1' }).click();
    await expect(field('x 1 (mm)')).toHaveValue('90');
    await expect(field('x 2 (mm)')).toHaveCount(0);
    await expect(dialog.getByRole('button', { name: 'Remove hole 1' })).toBeDisabled();
    await expect(dialog.getByText('· 1 holes')).toBeVisible();
    await addHole.click();
    await field('x 2 (mm)').fill('10');
    await field('y 2 (mm)').fill('10');
    await expect(dialog.getByText('· 2 holes')).toBeVisible();
    await save.click();
    await expect(dialog).toBeHidden();

    await page.getByRole('link', { name: 'X carriage plate', exact: true }).click();
    await expect(page.getByRole('table', { name: 'Holes' }).getByRole('row')).toHaveCount(3);
    await page.getByRole('button', { name: 'Edit pattern' }).click();
    const edit = page.getByRole('dialog', { name: 'Edit X carriage plate' });
    await expect(edit.getByLabel('Name')).toHaveValue('X carriage plate');
    await expect(edit.getByRole('tab', { name: 'List of holes' })).toHaveAttribute('aria-selected', 'true');
    await expect(edit.getByLabel('x 1 (mm)', { exact: true })).toHaveValue('90');
    await expect(edit.getByLabel('Ø 2 (mm)', { exact: true })).toHaveValue('6.6');
    await expect(edit.getByText('· 2 holes')).toBeVisible();
  });
});
