import { expect, test, type Locator, type Page } from '@playwright/test';
import { readFile } from 'node:fs/promises';
import path from 'node:path';
import { newAxis } from './support/machine-with-axis';
import { DEMO, signInAs, snap as snapPage } from './support/session';

/** Full-page screenshots from the top, so the fixed app bar does not land in the middle. */
async function snap(page: Page, name: string) {
  await page.mouse.move(0, 0); // no chart tooltip left open under the pointer
  await page.evaluate(() => window.scrollTo(0, 0));
  await snapPage(page, name);
}

const TABLET = { width: 820, height: 1180 };

/** What a spreadsheet puts on the clipboard, delivered as a paste event to a field. */
async function paste(field: Locator, text: string) {
  await field.focus();
  await field.evaluate((el, t) => {
    const data = new DataTransfer();
    data.setData('text/plain', t);
    el.dispatchEvent(new ClipboardEvent('paste', { clipboardData: data, bubbles: true, cancelable: true }));
  }, text);
}

async function openDrivesTab(page: Page, machineName: string) {
  await page.goto('/machines');
  await page.getByRole('link', { name: machineName }).first().click();
  await page.getByRole('tab', { name: 'Drives' }).click();
  await expect(page.getByRole('table', { name: 'Axes' })).toBeVisible();
}

test.describe('drives', () => {
  test('the Drives tab lists each axis with its drive, steps per mm and checks; Y2 needs correction', async ({
    page,
  }) => {
    await signInAs(page, DEMO.viewer);
    await openDrivesTab(page, 'Big plasma table');
    const axes = page.getByRole('table', { name: 'Axes' });
    const y2 = axes.getByRole('row').filter({ hasText: /^Y2/ });
    await expect(y2).toContainText('Rack and pinion, module 1.5, 20-tooth pinion');
    await expect(y2).toContainText('50.9296 steps/mm');
    await expect(y2.getByText('Outside target')).toBeVisible();
    await expect(y2).toContainText('-0.201 % scale error');
    await expect(axes.getByRole('row').filter({ hasText: /^Z/ })).toContainText('Screw Ø16 mm, lead 5 mm');
    await expect(page.getByRole('region', { name: 'Travel envelope' })).toContainText('1500 × 3000 mm');
    // Viewers read but do not add axes.
    await expect(page.getByRole('button', { name: 'Add axis' })).toHaveCount(0);
    await snap(page, 'drives-tab-plasma-desktop');
    await page.setViewportSize(TABLET);
    await snap(page, 'drives-tab-plasma-tablet');

    await page.setViewportSize({ width: 1366, height: 900 });
    await axes.getByRole('link', { name: 'Y2' }).click();
    await expect(page.getByRole('heading', { name: 'Axis Y2' })).toBeVisible();
    await expect(page.getByRole('region', { name: 'Travel trial result' })).toContainText('-0.201 %');
    await expect(page.getByRole('button', { name: /^Apply/ })).toHaveCount(0);
    await expect(page.getByRole('region', { name: 'Speed check' })).toContainText(
      'A rack-and-pinion drive has no screw to whirl',
    );
  });

  test('a technician enters a travel trial, applies the correction, and enters a 5-run repeat-and-reverse run by paste', async ({
    page,
  }) => {
    await signInAs(page, DEMO.technician);
    const { machineId, axisId } = await newAxis(page.request);
    await page.goto(`/machines/${machineId}/axes/${axisId}`);
    await expect(page.getByRole('heading', { name: 'Axis X' })).toBeVisible();
    await expect(page.getByText('Theoretical from the drive')).toBeVisible();

    // Travel trial: type the first move, Enter to the next row's first cell, paste the rest.
    await page.getByLabel('Commanded move 1').fill('200');
    await page.getByLabel('Measured move 1').fill('199.8');
    await page.getByLabel('Measured move 1').press('Enter');
    await expect(page.getByLabel('Commanded move 2')).toBeFocused();
    await paste(page.getByLabel('Commanded move 2'), '400\t399.6\n800\t799.2\n');
    await expect(page.getByLabel('Measured move 3')).toHaveValue('799.2');
    await page.getByRole('button', { name: 'Record trial' }).click();
    const trial = page.getByRole('region', { name: 'Travel trial result' });
    await expect(trial).toContainText('-0.100 %');
    await expect(trial.getByText('Outside target')).toBeVisible();
    // 640 × 200 ÷ 199.8 = 640.6406 steps/mm
    await expect(trial.getByLabel('Corrected steps per mm')).toHaveText('640.6406');
    await expect(trial.getByRole('figure', { name: /Error against commanded distance/ })).toBeVisible();
    await snap(page, 'axis-travel-trial-desktop');

    await trial.getByRole('button', { name: 'Apply 640.6406 steps/mm to axis X' }).click();
    await expect(trial.getByText(/Applied on .* Set 640.6406 steps\/mm in the controller/)).toBeVisible();
    const history = page.getByRole('table', { name: 'Steps per mm history' });
    await expect(history).toContainText('640 steps/mm');
    await expect(history).toContainText('640.6406 steps/mm');
    await expect(history).toContainText('Travel trial applied');
    await expect(page.getByText('Steps per mm in use').locator('..')).toContainText('640.6406 steps/mm');

    // Repeat-and-reverse: µm, targets pasted into the header row, the 10 × 5 block into the first cell.
    await page.getByLabel('Deviations in').click();
    await page.getByRole('option', { name: 'µm' }).click();
    // Five targets of our own in place of the test program's.
    await page.getByRole('combobox', { name: 'Targets', exact: true }).click();
    await page.getByRole('option', { name: '5', exact: true }).click();
    await paste(page.getByLabel('Target 1 (mm)'), '15\t236.2\t452.9\t674.3\t895');
    await expect(page.getByLabel('Target 5 (mm)')).toHaveValue('895');
    const block = [
      [6, 11, 9, 5, 4],
      [-2, 2, 1, -3, -4],
      [7, 12, 9, 4, 5],
      [-1, 3, 0, -4, -3],
      [5, 10, 8, 5, 3],
      [-2, 2, 1, -2, -4],
      [6, 12, 10, 4, 4],
      [-1, 3, 2, -3, -3],
      [6, 11, 9, 5, 4],
      [-2, 2, 1, -3, -4],
    ];
    await paste(page.getByLabel('Up 1, target 1'), block.map((r) => r.join('\t')).join('\n'));
    await expect(page.getByLabel('Down 5, target 5')).toHaveValue('-4');
    // Enter goes to the next row's first cell.
    await page.getByLabel('Up 1, target 2').press('Enter');
    await expect(page.getByLabel('Down 1, target 1')).toBeFocused();
    // The run's own conditions, beside the trial's on the same page: both temperatures refer it to 20 °C.
    await page.getByLabel('Machine temperature (runs)').fill('24');
    await page.getByLabel('Scale temperature (runs)').fill('22');
    await snap(page, 'axis-run-grid-desktop');
    await page.getByRole('button', { name: 'Record run' }).click();
    const run = page.getByRole('region', { name: 'Repeat-and-reverse result' });
    await expect(run.getByText('Positioning accuracy A')).toBeVisible();
    await expect(run).toContainText('machine 24 °C, scale 22 °C');
    await expect(run).toContainText('referred to 20 °C');
    await expect(run).toContainText('µm');
    await expect(run.getByText('Within target')).toBeVisible();
    await expect(run.getByRole('figure', { name: /Mean deviations up and down with ±2s bands/ })).toBeVisible();
    await expect(run.locator('.recharts-line').first()).toBeVisible();
    await snap(page, 'axis-run-result-desktop');
    await page.setViewportSize(TABLET);
    await snap(page, 'axis-page-tablet');
    await page.mouse.move(0, 0);
    await run.screenshot({ path: path.join(__dirname, 'screenshots', 'axis-run-result-tablet.png') });
    await trial.screenshot({ path: path.join(__dirname, 'screenshots', 'axis-travel-trial-tablet.png') });
  });

  test('a repeat-and-reverse run loads from a CSV file with a targets row and up/down rows', async ({ page }) => {
    await signInAs(page, DEMO.technician);
    const { machineId, axisId } = await newAxis(page.request);
    await page.goto(`/machines/${machineId}/axes/${axisId}`);
    const csv = [
      'target,20,300,610,880',
      ...[0, 1, 2, 3, 4].map((i) => `up,${0.004 + i * 0.001},0.006,0.005,0.003`),
      ...[0, 1, 2, 3, 4].map((i) => `down,${-0.004 - i * 0.001},-0.002,-0.003,-0.005`),
    ].join('\n');
    await page
      .getByLabel('CSV file of runs')
      .setInputFiles({ name: 'runs.csv', mimeType: 'text/csv', buffer: Buffer.from(csv) });
    await expect(page.getByLabel('Target 4 (mm)')).toHaveValue('880');
    await expect(page.getByLabel('Targets', { exact: true })).toHaveText('4');
    // The grid runs up, down, up…: the file's grouped rows land in their places.
    await expect(page.getByLabel('Up 1, target 1')).toHaveValue('0.004');
    await expect(page.getByLabel('Down 1, target 1')).toHaveValue('-0.004');
    await expect(page.getByLabel('Down 5, target 1')).toHaveValue('-0.008');
    await page.getByRole('button', { name: 'Record run' }).click();
    const run = page.getByRole('region', { name: 'Repeat-and-reverse result' });
    await expect(run.getByText('Reversal value B')).toBeVisible();
    await expect(run).toContainText('ISO 230-2 asks for at least 5 targets');
    // After recording, the grid is cleared for the next run.
    await expect(page.getByLabel('Up 1, target 1')).toHaveValue('');
  });

  test('the test program downloads as a G-code file with its parameters and the caution', async ({ page }) => {
    await signInAs(page, DEMO.technician);
    const { machineId, axisId } = await newAxis(page.request);
    await page.goto(`/machines/${machineId}/axes/${axisId}`);
    await page.getByRole('button', { name: 'Download test program' }).click();
    const dialog = page.getByRole('dialog');
    await expect(dialog).toContainText('plasma source or torch off');
    await dialog.getByLabel('Targets (mm, comma-separated)').fill('20, 300, 610, 880');
    await dialog.getByLabel('Feed rate').fill('900');
    await snap(page, 'axis-test-program-dialog-desktop');
    const [download] = await Promise.all([
      page.waitForEvent('download'),
      dialog.getByRole('button', { name: 'Download' }).click(),
    ]);
    expect(download.suggestedFilename()).toMatch(/-x-repeat-and-reverse\.nc$/);
    const text = await readFile((await download.path())!, 'utf8');
    expect(text).toContain('G21');
    expect(text).toContain('(Targets mm: 20, 300, 610, 880)');
    expect(text).toContain('G1 X880.000 F900');
    await expect(dialog).toContainText('downloaded');
    // A bad target list is answered in words.
    await dialog.getByLabel('Targets (mm, comma-separated)').fill('300, 20');
    await dialog.getByRole('button', { name: 'Download' }).click();
    await expect(dialog.getByRole('alert').filter({ hasText: 'targets must rise along the axis' })).toBeVisible();
  });

  test('a technician adds an axis: the drive type switches the fields and the theoretical value shows', async ({
    page,
  }) => {
    await signInAs(page, DEMO.technician);
    const machine = await page.request.post('/api/machines', {
      data: { name: `Axis form ${Date.now()}`, kind: 'plasma', workArea: { x: 3000, y: 1500 } },
    });
    const machineId = (await machine.json()).id as string;
    // Every question put to the drive calculator while the tab and the dialog are open.
    const asked: { type: string; pinionModule?: number; pinionTeeth?: number }[] = [];
    page.on('request', (r) => {
      if (new URL(r.url()).pathname === '/api/calc/drive') asked.push(r.postDataJSON());
    });
    await page.goto(`/machines/${machineId}?tab=drives`);
    await page.getByRole('button', { name: 'Add axis' }).click();
    const dialog = page.getByRole('dialog');
    // Nothing to save until the axis has a name.
    await expect(dialog.getByRole('button', { name: 'Add axis' })).toBeDisabled();
    await dialog.getByLabel('Axis name').fill('Y1');
    await expect(dialog.getByRole('button', { name: 'Add axis' })).toBeEnabled();
    await dialog.getByRole('button', { name: 'Rack and pinion' }).click();
    await expect(dialog.getByLabel('Lead')).toHaveCount(0);
    await dialog.getByLabel('Pinion module').fill('1.5');
    await dialog.getByLabel('Pinion teeth').fill('20');
    await dialog.getByLabel('Microsteps').fill('8');
    await dialog.getByLabel('Gear ratio').fill('3');
    // π × 1.5 × 20 = 94.2478 mm per turn; 200 × 8 × 3 ÷ 94.2478 = 50.9296 steps/mm
    await expect(dialog.getByTestId('theoretical-steps')).toHaveText('50.9296 steps/mm');
    // Asked only once the rack had its module and its teeth: never for the closed dialog, nor for
    // the screw offered first with no lead, nor for a module without teeth.
    expect(asked.length).toBeGreaterThan(0);
    for (const body of asked) expect(body).toMatchObject({ type: 'rack', pinionModule: 1.5, pinionTeeth: 20 });
    await dialog.getByRole('button', { name: 'Use the theoretical value' }).click();
    await dialog.getByLabel('Measured travel').fill('1540');
    await snap(page, 'axis-form-rack-desktop');
    await dialog.getByRole('button', { name: 'Add axis' }).click();
    await expect(dialog).toBeHidden();
    const row = page.getByRole('table', { name: 'Axes' }).getByRole('row').filter({ hasText: /^Y1/ });
    await expect(row).toContainText('Rack and pinion, module 1.5, 20-tooth pinion');
    await expect(row.getByText('Does not apply')).toBeVisible();
  });
  test('the edit dialog opens on the axis as recorded, forgets what was typed when cancelled, and clears an emptied feed rate', async ({
    page,
  }) => {
    await signInAs(page, DEMO.technician);
    const { machineId, axisId } = await newAxis(page.request, `Axis edit ${Date.now()}`);
    await page.goto(`/machines/${machineId}/axes/${axisId}`);
    await page.getByRole('button', { name: 'Edit axis' }).click();
    const dialog = page.getByRole('dialog', { name: 'Edit axis X' });
    await expect(dialog.getByLabel('Axis name')).toHaveValue('X');
    await expect(dialog.getByRole('textbox', { name: 'Lead' })).toHaveValue('5');
    // 200 steps × 16 microsteps ÷ 5 mm lead = 640 steps/mm (a 5 mm lead screw, common practice).
    await expect(dialog.getByTestId('theoretical-steps')).toHaveText('640 steps/mm');
    await dialog.getByRole('textbox', { name: 'Lead' }).fill('10');
    await expect(dialog.getByTestId('theoretical-steps')).toHaveText('320 steps/mm');
    await dialog.getByLabel('Notes').fill('Typed, then thought better of');
    await dialog.getByRole('button', { name: 'Cancel' }).click();
    await expect(dialog).toBeHidden();

    await page.getByRole('button', { name: 'Edit axis' }).click();
    await expect(dialog.getByRole('textbox', { name: 'Lead' })).toHaveValue('5');
    await expect(dialog.getByLabel('Notes')).toHaveValue('');
    await expect(dialog.getByTestId('theoretical-steps')).toHaveText('640 steps/mm');
    await expect(dialog.getByLabel('Fastest feed rate')).toHaveValue('5000');
    await dialog.getByLabel('Fastest feed rate').fill('');
    await dialog.getByLabel('Measured travel').fill('930');
    await dialog.getByRole('button', { name: 'Save changes' }).click();
    await expect(dialog).toBeHidden();
    const saved = await (await page.request.get(`/api/axes/${axisId}`)).json();
    expect(saved).toMatchObject({ maxFeedRate: null, measuredTravel: 930, drive: { type: 'screw', lead: 5 } });
  });
  test('an axis in inches: steps per inch, a trial in inches, a far correction asks first, warnings and temperatures on the run', async ({
    page,
  }) => {
    await signInAs(page, DEMO.technician);
    const machine = await page.request.post('/api/machines', {
      data: { name: `Inch axis ${Date.now()}`, kind: 'router', workArea: { x: 900, y: 600 } },
    });
    const machineId = (await machine.json()).id as string;
    // 200 steps × 8 microsteps × 5 threads per inch = 8000 steps/in (common practice), 314.9606 steps/mm.
    const axis = await page.request.post(`/api/machines/${machineId}/axes`, {
      data: {
        name: 'X',
        lengthUnit: 'in',
        drive: { type: 'screw', threadsPerInch: 5 },
        motorStepsPerRev: 200,
        microsteps: 8,
        stepsPerMm: 314.9606,
        maxFeedRate: 100,
        measuredTravel: 36,
      },
    });
    expect(axis.status()).toBe(201);
    const axisId = (await axis.json()).id as string;
    for (const viewport of [
      { width: 1280, height: 900 },
      { width: 390, height: 844 },
    ]) {
      await page.setViewportSize(viewport);
      await page.goto(`/machines/${machineId}/axes/${axisId}`);
      await expect(page.getByText('8000 steps/in').first()).toBeVisible();
      await expect(page.getByText('100.00 in/min').first()).toBeVisible();
    }
    await page.setViewportSize({ width: 1280, height: 900 });
    // The reported case, typed right: 20 in commanded, 19.95 in measured → 314.9606 × 20 / 19.95.
    await page.getByLabel('Commanded move 1').fill('20');
    await page.getByLabel('Measured move 1').fill('19.95');
    await page.getByRole('button', { name: 'Record trial' }).click();
    const trial = page.getByRole('region', { name: 'Travel trial result' });
    await expect(trial.getByLabel('Corrected steps per mm')).toHaveText(
      String(Number(((314.9606 * 20) / 19.95).toFixed(4))),
    );
    // The same moves with the commanded distance in mm by mistake: 25× off, held back until confirmed.
    await page.getByLabel('Commanded move 1').fill('20');
    await page.getByLabel('Measured move 1').fill('506.73');
    await page.getByLabel('Moves in').click();
    await page.getByRole('option', { name: 'mm' }).click();
    await page.getByLabel('Machine temperature', { exact: true }).fill('24');
    await page.getByRole('button', { name: 'Record trial' }).click();
    await expect(trial.locator('[data-warning-code="correction-far-from-theory"]')).toContainText('pulley teeth');
    await expect(trial.locator('[data-warning-code="temperature-incomplete"]')).toBeVisible();
    await trial.getByRole('button', { name: /^Apply/ }).click();
    const confirm = page.getByRole('dialog', { name: 'Apply a correction far from the theoretical value?' });
    await expect(confirm).toBeVisible();
    await snap(page, 'drives-far-correction-confirm-desktop');
    await confirm.getByRole('button', { name: 'Check first' }).click();
    await expect(confirm).toBeHidden();
    await expect(page.getByText('8000 steps/in').first()).toBeVisible();
    await snap(page, 'drives-inch-axis-desktop');
    await page.setViewportSize({ width: 390, height: 844 });
    await snap(page, 'drives-inch-axis-phone');
  });
});
