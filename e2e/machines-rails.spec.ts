import { expect, test, type Page } from '@playwright/test';
import { DEMO, signInAs, snap } from './support/session';
import { newMachineWithRail as railOf } from './support/machine-with-rail';

const TABLET = { width: 820, height: 1180 };

async function openMachine(page: Page, name: string) {
  await page.goto('/machines');
  await page.getByRole('link', { name }).click();
  await expect(page.getByRole('heading', { name, level: 1 })).toBeVisible();
}

const newMachineWithRail = (page: Page, name: string) =>
  railOf(page, name, { lengthMm: 600, holePitchMm: 100, firstHoleMm: 50 }, { x: 3000, y: 1500 }, 'Test frame');

test.describe('machines and rails', () => {
  test('a builder opens a machine file, adds a rail and enters a sweep by keyboard', async ({ page }) => {
    await signInAs(page, DEMO.builder);
    await newMachineWithRail(page, `Keyboard table ${Date.now()}`);
    // Holes at 50, 150 … 550 mm: one reading field per hole, Enter moves on.
    await expect(page.getByLabel('Hole positions').getByText('550')).toBeVisible();
    await expect(page.getByText('+ means the rail is further from the reference')).toBeVisible();
    const first = page.getByLabel('Reading at 50 mm');
    await first.click();
    for (const r of ['0', '1', '2.5']) {
      await page.keyboard.type(r);
      await page.keyboard.press('Enter');
    }
    await expect(page.getByLabel('Reading at 350 mm')).toBeFocused();
    // Readings typed so far survive a reload of the page.
    await page.reload();
    await expect(page.getByLabel('Reading at 250 mm')).toHaveValue('2.5');
    await page.getByLabel('Reading at 350 mm').click();
    for (const r of ['3', '1.5', '0']) {
      await page.keyboard.type(r);
      await page.keyboard.press('Enter');
    }
    await expect(page.getByLabel('Reading at 550 mm')).toHaveValue('0');
    await expect(page.getByRole('button', { name: 'Save sweep' })).toBeFocused();
    await expect(page.getByRole('figure', { name: 'Live straightness chart' })).toBeVisible();
    await expect(
      page.getByRole('figure', { name: 'Live straightness chart' }).locator('.recharts-line-dots circle').first(),
    ).toBeVisible();
    // A bow of 3 thou on a 2 thou target: the live verdict is outside before saving.
    await expect(page.getByRole('region', { name: 'New sweep' }).getByText('Outside target')).toBeVisible();
    // The usual torque for the rail's typical bolt (M5 on a 20 mm rail) is offered, not imposed.
    await page.getByRole('button', { name: 'Use 8.8' }).click();
    await expect(page.getByLabel('Torque')).toHaveValue('8.8');
    await page.getByRole('button', { name: 'As left' }).click();
    await snap(page, 'rail-entry-desktop');
    await page.setViewportSize(TABLET);
    await snap(page, 'rail-entry-tablet');
    await page.setViewportSize({ width: 1366, height: 900 });
    await page.getByRole('button', { name: 'Save sweep' }).click();
    const saved = page.getByRole('region', { name: 'Sweep saved' });
    // Judged on the minimum zone (ISO 1101's definition), the reference the default target names.
    await expect(
      saved.getByText(
        /Minimum-zone straightness \(ISO 1101\) .* thou against a target of 2 thou \(judged on the minimum zone\): outside target/,
      ),
    ).toBeVisible();
    await expect(saved.getByTestId('local-slope')).toHaveText(/\d\.\d{3} mm\/m/);
    await expect(saved.getByText(/As left .* M5 at 8\.8 N·m/)).toBeVisible();
    await expect(saved.getByRole('table', { name: 'Residual per station' }).getByRole('row')).toHaveCount(7);
    await expect(page.getByRole('table', { name: 'Sweeps' }).getByRole('row')).toHaveCount(2);
    // The draft is cleared for the next sweep and nothing is left waiting.
    await expect(page.getByLabel('Reading at 50 mm')).toHaveValue('');
  });

  test('a CSV import with a bad row is refused until the row is fixed, then imported', async ({ page }) => {
    await signInAs(page, DEMO.technician);
    await newMachineWithRail(page, `CSV table ${Date.now()}`);
    await page.getByRole('button', { name: 'Import CSV' }).click();
    const dialog = page.getByRole('dialog', { name: 'Import readings from CSV' });
    const importButton = dialog.getByRole('button', { name: /^Import \d+ station/ });
    // Two good lines are not a sweep: said before any import is tried, and the import stays refused.
    await dialog.getByLabel('Paste readings').fill('position_mm,reading\n0,0\n150,0.5\n');
    await expect(dialog.getByRole('alert').filter({ hasText: 'A sweep needs at least three stations.' })).toBeVisible();
    await expect(importButton).toHaveText('Import 2 stations');
    await expect(importButton).toBeDisabled();
    await dialog.getByLabel('Paste readings').fill('position_mm,reading\n0,0\n150,0.5\n300,abc\n450,1\n450,0.5\n600\n');
    const preview = dialog.getByRole('table', { name: 'Import preview' });
    await expect(preview.getByText('Reading "abc" is not a number')).toBeVisible();
    await expect(preview.getByText('Position 450 mm repeats line 5')).toBeVisible();
    await expect(preview.getByText('Missing reading')).toBeVisible();
    await expect(dialog.getByText('3 rows must be fixed in the text or dropped before the import.')).toBeVisible();
    // With bad rows the stations-count warning gives way to the rows to fix.
    await expect(dialog.getByText('A sweep needs at least three stations.')).toHaveCount(0);
    await expect(importButton).toBeDisabled();
    await snap(page, 'rail-csv-refused-desktop');
    // Fix one in the text, drop the other two.
    await dialog.getByLabel('Paste readings').fill('position_mm,reading\n0,0\n150,0.5\n300,1.5\n450,1\n450,0.5\n600\n');
    await dialog.getByRole('button', { name: 'Drop bad rows' }).click();
    await expect(importButton).toHaveText('Import 4 stations');
    await importButton.click();
    await expect(page.getByLabel('Reading at 300 mm')).toHaveValue('1.5');
    await page.getByRole('button', { name: 'Save sweep' }).click();
    await expect(
      page
        .getByRole('region', { name: 'Sweep saved' })
        .getByText(/against a target of 2 thou \(judged on the minimum zone\): within target/),
    ).toBeVisible();
  });

  test('the specification is edited with the target set chosen; a CSV file can be uploaded', async ({ page }) => {
    await signInAs(page, DEMO.builder);
    const name = `Spec table ${Date.now()}`;
    await newMachineWithRail(page, name);
    await page.getByRole('button', { name: 'Import CSV' }).click();
    const dialog = page.getByRole('dialog', { name: 'Import readings from CSV' });
    await dialog.getByLabel('CSV file').setInputFiles({
      name: 'sweep.csv',
      mimeType: 'text/csv',
      buffer: Buffer.from('position;reading\n0;0\n200;0,5\n400;1\n600;0,5\n'),
    });
    await expect(dialog.getByRole('table', { name: 'Import preview' }).getByRole('row')).toHaveCount(5);
    await dialog.getByRole('button', { name: 'Import 4 stations' }).click();
    await expect(page.getByLabel('Reading at 200 mm')).toHaveValue('0.5');
    await page.getByRole('link', { name }).click();
    await page.getByRole('tab', { name: 'Specification' }).click();
    await page.getByRole('button', { name: 'Edit specification' }).click();
    const edit = page.getByRole('dialog', { name: 'Edit specification' });
    await edit.getByLabel('Target set').click();
    await page.getByRole('option', { name: 'Router (default)' }).click();
    await expect(page.getByRole('listbox')).toBeHidden();
    await expect(edit.getByLabel('Target set')).toHaveText(/Router \(default\)/);
    await edit.getByLabel('Work area X').fill('2500');
    await edit.getByRole('button', { name: 'Save specification' }).click();
    await expect(edit).toBeHidden();
    await expect(page.getByText(/work area 2500 × 1500 mm · Router \(default\)/)).toBeVisible();
  });

  test('a new machine is not sent until its name and work area are right, each problem shown under its field', async ({
    page,
  }) => {
    await signInAs(page, DEMO.builder);
    const sent: unknown[] = [];
    page.on('request', (r) => {
      if (r.method() === 'POST' && new URL(r.url()).pathname === '/api/machines') sent.push(r.postDataJSON());
    });
    await page.goto('/machines');
    await page.getByRole('button', { name: 'New machine' }).click();
    const dialog = page.getByRole('dialog', { name: 'New machine' });
    const name = dialog.getByLabel('Name');
    const x = dialog.getByLabel('Work area X');
    const y = dialog.getByLabel('Work area Y');
    const open = dialog.getByRole('button', { name: 'Open machine file' });
    // Nothing is flagged before the first try.
    await expect(x).toHaveAccessibleDescription('Width to cover');
    await open.click();
    await expect(name).toHaveAccessibleDescription('Give the machine a name');
    await expect(x).toHaveAccessibleDescription('A number of mm');
    await expect(y).toHaveAccessibleDescription('A number of mm');
    // From then on every change is checked: half a millimetre is below the 1 mm floor.
    await x.fill('0.5');
    await expect(x).toHaveAccessibleDescription('Between 1 mm and 100 m');
    // In inches, 0.5 in is 12.7 mm (1 in = 25.4 mm exactly) and passes; 5000 in (127 m) is beyond 100 m.
    await dialog.getByLabel('Work area unit').click();
    await page.getByRole('option', { name: 'in', exact: true }).click();
    await expect(x).toHaveAccessibleDescription('Width to cover');
    await y.fill('5000');
    await expect(y).toHaveAccessibleDescription('Between 1 mm and 100 m');
    await expect(name).toHaveAccessibleDescription('Give the machine a name');
    await open.click();
    await expect(dialog).toBeVisible();
    expect(sent).toEqual([]);
    const machine = `Checked table ${Date.now()}`;
    await name.fill(machine);
    await x.fill('120,5');
    await y.fill('50');
    await expect(y).toHaveAccessibleDescription('Length to cover');
    await open.click();
    await expect(page.getByRole('heading', { name: machine, level: 1 })).toBeVisible();
    // A decimal comma reads as a point, as in the entry grids.
    expect(sent).toEqual([expect.objectContaining({ name: machine, lengthUnit: 'in', workArea: { x: 120.5, y: 50 } })]);
  });

  test('the demo router is within target on every rail and pair; the plasma table is not', async ({ page }) => {
    await signInAs(page, DEMO.viewer);
    const machines = await (await page.request.get('/api/machines')).json();
    const router = machines.find((m: { name: string }) => m.name === 'Small router');
    const plasma = machines.find((m: { name: string }) => m.name === 'Big plasma table');
    const routerRails = await (await page.request.get(`/api/machines/${router.id}/rails`)).json();
    expect(routerRails.length).toBe(4);
    for (const r of routerRails) {
      expect(r.latestSweep.status).toBe('within-target');
      const p = await (await page.request.get(`/api/rails/${r.id}/parallelism`)).json();
      expect(p.status).toBe('within-target');
    }
    const plasmaRails = await (await page.request.get(`/api/machines/${plasma.id}/rails`)).json();
    expect(plasmaRails.map((r: { label: string }) => r.label).sort()).toEqual([
      'X front',
      'X rear',
      'Y1 (left)',
      'Y2 (right)',
    ]);
    expect(
      plasmaRails.some((r: { latestSweep: { status: string } }) => r.latestSweep.status === 'outside-target'),
    ).toBe(true);
  });

  test('a viewer reads rails and target sets but records nothing', async ({ page }) => {
    await signInAs(page, DEMO.viewer);
    await page.goto('/machines');
    await expect(page.getByRole('button', { name: 'New machine' })).toHaveCount(0);
    await openMachine(page, 'Big plasma table');
    await page.getByRole('tab', { name: 'Rails' }).click();
    await expect(page.getByRole('button', { name: 'Add rail' })).toHaveCount(0);
    await page.getByRole('link', { name: 'Y2 (right)' }).click();
    await expect(page.getByRole('region', { name: 'Sweep history' })).toBeVisible();
    await expect(page.getByRole('region', { name: 'New sweep' })).toHaveCount(0);
    await page.goto('/target-sets');
    await expect(page.getByText('Read only').first()).toBeVisible();
    await expect(page.getByRole('table', { name: 'Targets of Plasma table (default)' })).toContainText(
      'common practice',
    );
  });

  test('an owner edits a target set', async ({ page }) => {
    await signInAs(page, DEMO.owner);
    await page.goto('/target-sets');
    await page.getByRole('button', { name: 'Edit Router (default)' }).click();
    const dialog = page.getByRole('dialog');
    const field = dialog.getByLabel('Re-check interval: value');
    const before = await field.inputValue();
    await field.fill('45');
    await dialog.getByRole('button', { name: 'Save targets' }).click();
    await expect(dialog).toBeHidden();
    await expect(page.getByRole('table', { name: 'Targets of Router (default)' })).toContainText('45 days');
    await snap(page, 'target-sets-desktop');
    // Put it back: other checks of the demo router are judged against this set.
    await page.getByRole('button', { name: 'Edit Router (default)' }).click();
    await dialog.getByLabel('Re-check interval: value').fill(before);
    await dialog.getByRole('button', { name: 'Save targets' }).click();
    await expect(page.getByRole('table', { name: 'Targets of Router (default)' })).toContainText(`${before} days`);
  });

  // An inch rail with a top-face sweep in thou from a coarse dial: both unit pickers, the face,
  // the reference beside the target, the local slope and the warnings, on a phone and a desktop.
  for (const [size, viewport] of [
    ['phone', { width: 390, height: 844 }],
    ['1280', { width: 1280, height: 900 }],
  ] as const) {
    test(`an inch rail with a warned sweep reads clearly at ${size} size`, async ({ page }) => {
      await page.setViewportSize(viewport);
      await signInAs(page, DEMO.builder);
      const machine = await page.request.post('/api/machines', {
        data: { name: `Inch table ${size} ${Date.now()}`, kind: 'plasma', workArea: { x: 1200, y: 800 } },
      });
      const machineId = (await machine.json()).id as string;
      const made = await page.request.post(`/api/machines/${machineId}/rails`, {
        data: {
          label: 'Y1 (left)',
          axis: 'Y1',
          lengthUnit: 'in',
          length: 48,
          holePitch: 2.4,
          firstHole: 1.2,
          spacing: 36,
          profileSize: 20,
        },
      });
      expect(made.status()).toBe(201);
      const railId = (await made.json()).id as string;
      const sweep = await page.request.post(`/api/rails/${railId}/sweeps`, {
        data: {
          readingUnit: 'thou',
          lengthUnit: 'in',
          face: 'top',
          phase: 'as-found',
          resolution: 1,
          datum: 'Level bar',
          stations: [0, 12, 24, 36].map((position, i) => ({ position, reading: [0, 1, 3, 1][i] })),
        },
      });
      expect(sweep.status()).toBe(201);
      await page.goto(`/machines/${machineId}/rails/${railId}`);
      const geometry = page.getByRole('region', { name: 'Rail geometry' });
      await expect(geometry).toContainText('48 in (1219.2 mm)');
      await expect(geometry).toContainText('Spacing to partner');
      await expect(page.getByLabel('Reading unit')).toBeVisible();
      await expect(page.getByLabel('Position unit')).toBeVisible();
      await expect(page.getByLabel('Face read')).toBeVisible();
      await snap(page, `rail-page-inch-${size}`);
      await page.getByRole('table', { name: 'Sweeps' }).getByRole('button').first().click();
      await expect(page.getByTestId('sweep-warnings')).toContainText('coarser than a quarter of the 2 thou tolerance');
      await expect(page.getByTestId('local-slope')).toHaveText(/mm\/m/);
      await expect(page.getByText(/judged on the minimum zone/).first()).toBeVisible();
      await page.getByTestId('sweep-warnings').scrollIntoViewIfNeeded();
      await snap(page, `rail-sweep-warned-${size}`);
    });
  }

  for (const [size, viewport] of [
    ['desktop', { width: 1366, height: 900 }],
    ['tablet', TABLET],
  ] as const) {
    test(`screenshots at ${size} size: machines list, rails tab, rail page`, async ({ page }) => {
      await page.setViewportSize(viewport);
      await signInAs(page, DEMO.builder);
      await page.goto('/machines');
      await expect(page.getByRole('link', { name: 'Big plasma table' })).toBeVisible();
      await snap(page, `machines-list-${size}`);
      // The state filter: "Re-check due" hides the tables being built, "All" brings them back.
      const states = page.getByRole('group', { name: 'Filter by state' });
      await states.getByRole('button', { name: /^Re-check due/ }).click();
      await expect(page.getByRole('link', { name: 'Big plasma table' })).toBeHidden();
      await states.getByRole('button', { name: 'All' }).click();
      await expect(page.getByRole('link', { name: 'Big plasma table' })).toBeVisible();
      await openMachine(page, 'Big plasma table');
      await page.getByRole('tab', { name: 'Rails' }).click();
      await expect(page.getByRole('region', { name: /Parallelism Y/ })).toContainText('target');
      await snap(page, `machine-rails-tab-${size}`);
      await page.getByRole('table', { name: 'Rails' }).getByRole('link', { name: 'Y2 (right)' }).click();
      await expect(page.getByRole('table', { name: 'Sweeps' }).getByRole('row').nth(3)).toBeVisible(); // three demo sweeps at least
      await expect(page.getByRole('figure', { name: 'Sweeps overlaid' })).toBeVisible();
      await snap(page, `rail-page-${size}`);
    });
  }
});
