import { expect, test } from '@playwright/test';
import { DEMO, signInAs, snap } from './support/session';

// Constructed straightness set S1 (stations mm, readings µm): least squares 81/11 µm,
// minimum zone 27/4 µm, end points 73/10 µm.
const S1 = [
  '0\t0',
  '100\t3',
  '200\t7',
  '300\t8',
  '400\t6',
  '500\t9',
  '600\t12',
  '700\t10',
  '800\t7',
  '900\t8',
  '1000\t11',
].join('\n');

test.describe('calculators page', () => {
  test('a technician types a straightness set and the result follows without a submit', async ({ page }) => {
    await signInAs(page, DEMO.technician);
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Calculators' }).click();
    await expect(page.getByRole('heading', { name: 'Calculators' })).toBeVisible();
    await expect(page.getByRole('tab', { name: 'Straightness' })).toHaveAttribute('aria-selected', 'true');

    const box = page.getByLabel('Stations and readings');
    await box.fill('0\t0\n100\t3');
    await expect(page.getByText('Enter at least three stations')).toBeVisible();
    await box.fill(S1);
    const result = page.getByRole('table', { name: 'Straightness result' });
    await expect(result.getByRole('row', { name: /minimum zone/ })).toContainText('6.75 µm');
    await expect(result.getByRole('row', { name: /least squares/ })).toContainText('7.36 µm');
    await expect(result.getByRole('row', { name: /end points/ })).toContainText('7.30 µm');
    const chart = page.getByRole('figure', { name: 'Straightness chart' });
    await expect(chart.locator('.recharts-area-area')).toBeVisible();
    await expect(chart.locator('.recharts-line-dots circle')).toHaveCount(11);
    await snap(page, 'calculators-straightness');

    // Same readings read as thou: 6.75 thou = 0.171 45 mm.
    await page.getByLabel('Reading unit').click();
    await page.getByRole('option', { name: 'thou' }).click();
    await expect(result.getByRole('row', { name: /minimum zone/ })).toContainText('6.750 thou');

    // Cutting the set below three stations takes the result and chart away rather than leaving a stale one.
    await box.fill('0\t0\n100\t3');
    await expect(page.getByText('Enter at least three stations')).toBeVisible();
    await expect(page.getByRole('figure', { name: 'Straightness chart' })).toHaveCount(0);

    await page.setViewportSize({ width: 820, height: 1180 });
    await box.fill(S1);
    await expect(result.getByRole('row', { name: /minimum zone/ })).toContainText('6.750 thou');
    await snap(page, 'calculators-straightness-tablet');
  });

  test('a bad line is named and the server refusal is shown', async ({ page }) => {
    await signInAs(page, DEMO.builder);
    await page.goto('/calculators?calc=straightness');
    const box = page.getByLabel('Stations and readings');
    await box.fill('station\treading\n0\t1\n100\tx\n200\t3');
    await expect(page.getByRole('alert').filter({ hasText: 'Line 3' })).toBeVisible();
    await box.fill('0\t1\n100\t2\n100\t3');
    await expect(page.getByRole('alert').filter({ hasText: 'positions repeats the value 100' })).toBeVisible();
  });

  test('the other calculators answer from their inputs, with charts where they help', async ({ page }) => {
    await signInAs(page, DEMO.technician);
    await page.goto('/calculators');

    // Constructed ISO 230-2 set (5 targets, 5 runs each way, µm): A = 9 + 2√2, R = 4 + 2√2, B = 4.
    await page.getByRole('tab', { name: 'Repeat-and-reverse run' }).click();
    await page
      .getByLabel('Targets and deviations')
      .fill(
        [
          '0\t2\t3\t1\t2\t2\t-2\t-1\t-3\t-2\t-2',
          '125\t5\t6\t4\t5\t5\t1\t2\t0\t1\t1',
          '250\t3\t4\t2\t4\t2\t0\t1\t-1\t0\t0',
          '375\t-1\t0\t-2\t-1\t-1\t-4\t-3\t-5\t-4\t-4',
          '500\t1\t2\t0\t1\t1\t-3\t-2\t-4\t-3\t-3',
        ].join('\n'),
      );
    const iso = page.getByRole('table', { name: 'Positioning result' });
    await expect(iso.getByRole('row', { name: /Accuracy A/ })).toContainText('11.83 µm');
    await expect(iso.getByRole('row', { name: /Repeatability R/ })).toContainText('6.83 µm');
    await expect(iso.getByRole('row', { name: /Reversal value B/ })).toContainText('4.00 µm');
    await expect(page.getByRole('figure', { name: 'Positioning chart' }).locator('.recharts-area-area')).toHaveCount(2);
    await snap(page, 'calculators-positioning');

    // Calibration rule new = old × commanded ÷ measured: 640 × 100 / 99.8 = 641.2826.
    await page.getByRole('tab', { name: 'Travel trial' }).click();
    await page.getByLabel('Steps per mm used').fill('640');
    await page.getByLabel('Commanded and measured moves').fill('100\t99.8\n200\t199.62\n400\t399.18');
    const trial = page.getByRole('table', { name: 'Travel trial result' });
    await expect(trial.getByRole('row', { name: /Corrected steps per mm/ })).toContainText('steps/mm');
    await expect(
      page.getByRole('figure', { name: 'Travel error chart' }).locator('.recharts-scatter-symbol'),
    ).toHaveCount(3);
    await snap(page, 'calculators-travel-trial');
    await page.getByLabel('Commanded and measured moves').fill('100\t99.8');
    await expect(trial.getByRole('row', { name: /Corrected steps per mm/ })).toContainText('641.2826 steps/mm');
    // The same rule with the moves in inches: 80 × 20 / 19.95 = 80.2005 steps/mm, 2037.093 steps/in.
    await page.getByLabel('Steps per mm used').fill('80');
    await page.getByLabel('Move unit').click();
    await page.getByRole('option', { name: 'in', exact: true }).click();
    await page.getByLabel('Commanded and measured moves').fill('20\t19.95');
    await expect(trial.getByRole('row', { name: /Corrected steps per mm/ })).toContainText('80.2005 steps/mm');
    await expect(trial.getByRole('row', { name: /Corrected steps per inch/ })).toContainText('2037.093 steps/in');
    // A correction 25 times off (a measurement in inches typed as mm) is flagged, not quietly given.
    await page.getByLabel('Move unit').click();
    await page.getByRole('option', { name: 'mm', exact: true }).click();
    await page.getByLabel('Commanded and measured moves').fill('500\t19.69');
    await expect(page.getByRole('region', { name: 'Warnings' }).getByRole('alert').first()).toContainText(
      /same unit|lead/,
    );
    await snap(page, 'calculators-travel-trial-warning');

    // MISUMI catalogue example: Ø15, root 12.5 mm, fixed–supported, 790 mm → 3024 rpm allowable.
    await page.getByRole('tab', { name: 'Speed check' }).click();
    await page.getByLabel('Nominal diameter').fill('15');
    await page.getByLabel('Root diameter').fill('12.5');
    await page.getByLabel('Unsupported length').fill('790');
    await page.getByLabel('Feed rate').fill('10000');
    const speed = page.getByRole('table', { name: 'Screw speed result' });
    await expect(speed.getByRole('row', { name: /Permissible speed/ })).toContainText('3,024 rpm');
    await expect(page.getByText('Within the limits')).toBeVisible();
    await snap(page, 'calculators-speed-check');

    // 200-step motor, 8 microsteps, 5 mm lead → 320 steps/mm (common practice).
    await page.getByRole('tab', { name: 'Steps per mm' }).click();
    // The speed check has a field named Lead too: type into this tab's own, once it is shown.
    const drive = page.getByRole('tabpanel', { name: 'Steps per mm' });
    await drive.getByLabel('Lead').fill('5');
    await expect(
      page.getByRole('table', { name: 'Steps per mm result' }).getByRole('row', { name: /^Steps per mm/ }),
    ).toContainText('320 steps/mm');
    // A 5 threads-per-inch screw advances 0.2 in a turn: 200 × 8 / 0.2 = 8000 steps/in (definition of TPI).
    await page.getByLabel('Screw given by').click();
    await page.getByRole('option', { name: /Threads per inch/ }).click();
    await page.getByLabel('Threads per inch').fill('5');
    await expect(
      page.getByRole('table', { name: 'Steps per mm result' }).getByRole('row', { name: /^Steps per inch/ }),
    ).toContainText('8000 steps/in');

    // Constructed diagonal example: 1000 × 600 mm with the Y side leaning 0.5 mm → 0.5 mm over 600 mm.
    await page.getByRole('tab', { name: 'Diagonal check' }).click();
    await page.getByLabel('Side along X').fill('1000');
    await page.getByLabel('Side along Y').fill('600.0002');
    await page.getByLabel('Diagonal 1').fill('1166.6192');
    await page.getByLabel('Diagonal 2').fill('1165.7617');
    await page.getByLabel('Gantry span').fill('600');
    const square = page.getByRole('table', { name: 'Squareness result' });
    await expect(square.getByRole('row', { name: /Move one side/ })).toContainText('0.5000 mm');
    await expect(square.getByRole('row', { name: /Longer diagonal/ })).toContainText('Diagonal 1');
    await snap(page, 'calculators-diagonal-check');
  });
});
