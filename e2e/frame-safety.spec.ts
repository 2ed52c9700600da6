import { expect, test, type Page } from '@playwright/test';
import path from 'node:path';
import { DEMO, signInAs, snap } from './support/session';

async function openTab(page: Page, machine: string, tab: 'Frame' | 'Safety walk') {
  await page.goto('/machines');
  await page.getByRole('link', { name: machine }).click();
  await page.getByRole('tab', { name: tab }).click();
}

/** A close look at one figure, beside the full-page shots. */
const shoot = (page: Page, selector: string, name: string) =>
  page
    .locator(selector)
    .first()
    .screenshot({ path: path.join(__dirname, 'screenshots', `${name}.png`) });

test.describe('frame and safety walk', () => {
  test('a technician records a diagonal check and a 3 × 4 bed grid and answers the safety walk', async ({ page }) => {
    await signInAs(page, DEMO.technician);
    await openTab(page, 'Big plasma table', 'Frame');

    // The seeded squaring history converges; the newest check is drawn.
    const history = page.getByRole('table', { name: 'Diagonal checks' });
    await expect(history.getByRole('row')).toHaveCount(6);
    const form = page.getByRole('form', { name: 'Diagonal check' });
    // Every length of the check is in the one length unit; there are no readings here.
    await expect(form.getByLabel('Length unit')).toBeVisible();
    await form.getByLabel('X side').fill('2000');
    await form.getByLabel('Y side').fill('1200');
    await form.getByLabel(/^Diagonal 1/).fill('2332.15');
    await form.getByLabel(/^Diagonal 2/).fill('2332.85');
    await form.getByLabel(/^Gantry span/).fill('3200');
    await form.getByRole('button', { name: 'Record diagonal check' }).click();
    await expect(history.getByRole('row')).toHaveCount(7);
    // Diagonal 2 long by 0.7 mm on 2000 × 1200: 0.34 mm/m, outside the 0.23 mm/m plasma target
    // (0.5 mm diagonal difference on a 1500 mm square, re-derived from its source).
    await expect(page.getByTestId('squareness-result')).toContainText('0.34');
    await expect(
      page.getByRole('region', { name: 'Diagonal check' }).getByText('outside target').first(),
    ).toBeVisible();
    // No resolution given: a tape (about 1/32 in) is too coarse for the 0.47 mm the target allows here.
    await expect(page.getByRole('list', { name: 'Diagonal check warnings' })).toContainText(
      /A tape reads to about 1\/32 in \(0.794 mm\)/,
    );
    await expect(page.getByText(/Lean exaggerated ×\d+/)).toBeVisible();
    await expect(page.getByText(/Move the X0 end back towards Y0 by 1\.0\d mm/)).toBeVisible();
    await shoot(page, 'svg[aria-label^="Measured rectangle"]', 'frame-squareness-drawing-desktop');
    // Entered by mistake: deleted after a confirmation, the seeded history is current again.
    await page.getByRole('region', { name: 'Diagonal check' }).getByRole('button', { name: 'Delete' }).click();
    await page.getByRole('dialog').getByRole('button', { name: 'Delete' }).click();
    await expect(history.getByRole('row')).toHaveCount(6);
    await expect(page.getByTestId('squareness-result')).toContainText('0.121');

    // A 3 × 4 grid by keyboard: type, Enter to the next cell.
    const grid = page.getByRole('form', { name: 'Bed grid' });
    await expect(grid.getByLabel('Position unit')).toBeVisible();
    await expect(grid.getByLabel('Height unit')).toBeVisible();
    await expect(grid.getByLabel('Rows')).toHaveValue('3');
    await expect(grid.getByLabel('Columns')).toHaveValue('4');
    const heights = [
      '0.10',
      '0.05',
      '0.00',
      '-0.05',
      '0.08',
      '0.02',
      '0.62',
      '-0.04',
      '0.04',
      '0.00',
      '-0.02',
      '-0.08',
    ];
    await grid.getByLabel('Height at row 1, column 1').click();
    for (const h of heights) {
      await page.keyboard.type(h);
      await page.keyboard.press('Enter');
    }
    await expect(grid.getByLabel('Height at row 3, column 4')).toHaveValue('-0.08');
    await grid.getByRole('button', { name: 'Record bed grid' }).click();
    // A plasma table is judged on the range of heights as the gantry-carried gauge read them: 0.62 − (−0.08) = 0.70 mm.
    await expect(page.getByTestId('flatness-result')).toContainText(
      'Height range to the gantry’s plane of travel (tilt left in): 0.0276 in (0.700 mm)',
    );
    await expect(page.getByRole('definition').filter({ hasText: /mm/ }).first()).toBeVisible();
    await expect(page.getByText('Minimum-zone flatness (ISO 1101)', { exact: true })).toBeVisible();
    await expect(page.getByText('Least-squares flatness', { exact: true })).toBeVisible();
    // Twelve points on a 3 × 4 grid over part of the bed: fewer than 3 × 3 is fine, but the grid does not cover the bed.
    await expect(page.getByRole('list', { name: 'Worst points' }).getByRole('listitem').first()).toContainText(
      'row 2, column 3: +0.35',
    );
    await expect(
      page.getByRole('img', {
        name: /Bed grid colour map of heights in mm from the middle of the height range, 3 rows by 4 columns/,
      }),
    ).toBeVisible();
    await shoot(page, 'svg[aria-label^="Bed grid colour map"]', 'frame-bed-grid-map-desktop');
    await shoot(page, 'section[aria-labelledby="bed-grid-title"]', 'frame-bed-grid-desktop');
    // The seeded cut's 400 mm square is judged in its own ISO 9013 band, not the 35–125 mm one.
    const parts = page.getByRole('table', { name: 'Part sizes' });
    await expect(parts).toContainText('315–1000 mm parts');
    await expect(parts).toContainText('35–125 mm parts');
    await expect(page.getByRole('form', { name: 'Test cut' }).getByLabel('Plate thickness')).toBeVisible();
    await shoot(page, 'section[aria-labelledby="test-cut-title"]', 'frame-test-cut-desktop');
    await snap(page, 'frame-tab-desktop');

    // The safety walk: the seeded "no" blocks approval; answer one more item.
    await page.getByRole('tab', { name: 'Safety walk' }).click();
    await expect(
      page.getByText(/does not replace local codes, the equipment makers’ instructions, or licensed practice/),
    ).toBeVisible();
    await expect(page.getByText('Blocks approval')).toBeVisible();
    const before = await page.getByTestId('walk-counts').textContent();
    expect(before).toMatch(/^7 of 14 answered/);
    const item = page.getByRole('group', { name: /licensed electrician/ });
    await item.getByLabel('Note').fill('Inspected by the site electrician, certificate in the office');
    await item.getByRole('button', { name: 'Yes' }).click();
    await expect(item).toContainText('Yes · Tamsin Hale');
    await expect(page.getByTestId('walk-counts')).toContainText('8 of 14 answered');
    await expect(page.getByTestId('walk-status')).toHaveText('Not complete');
    // Put the "no" right: the walk no longer blocks.
    await page
      .getByRole('group', { name: /extraction or ventilation/ })
      .getByRole('button', { name: 'Yes' })
      .click();
    await expect(page.getByText('Blocks approval')).toHaveCount(0);
    await page.reload();
    await expect(page.getByRole('group', { name: /licensed electrician/ }).getByLabel('Note')).toHaveValue(
      'Inspected by the site electrician, certificate in the office',
    );
    // Leaving a note unchanged sends nothing; leaving it changed saves it with the answer already given.
    const sent: { answer: string; note?: string }[] = [];
    page.on('request', (r) => {
      if (r.method() === 'PUT' && r.url().includes('/safety-walk/items/')) sent.push(r.postDataJSON());
    });
    const note = page.getByRole('group', { name: /licensed electrician/ }).getByLabel('Note');
    await note.click();
    await note.press('Tab');
    await note.fill('  Inspected by the site electrician, certificate on the wall  ');
    const saved = page.waitForResponse(
      (r) => r.request().method() === 'PUT' && r.url().includes('/safety-walk/items/'),
    );
    await note.press('Tab');
    expect((await saved).ok()).toBe(true);
    expect(sent).toEqual([{ answer: 'yes', note: 'Inspected by the site electrician, certificate on the wall' }]);
    await expect(note).toHaveValue('Inspected by the site electrician, certificate on the wall');
    await page.reload();
    await expect(page.getByRole('group', { name: /licensed electrician/ }).getByLabel('Note')).toHaveValue(
      'Inspected by the site electrician, certificate on the wall',
    );
    await snap(page, 'safety-walk-desktop');
  });

  test('the diagonal check and the test cut name each bad length under its field, send nothing until put right, then send what was typed', async ({
    page,
  }) => {
    await signInAs(page, DEMO.technician);
    const machine = await page.request.post('/api/machines', {
      data: { name: `Frame forms ${Date.now()}`, kind: 'plasma', workArea: { x: 3000, y: 1500 } },
    });
    const machineId = (await machine.json()).id as string;
    const sent: Record<string, unknown[]> = {};
    page.on('request', (r) => {
      const kind = /\/(diagonal-checks|test-cuts)$/.exec(new URL(r.url()).pathname)?.[1];
      if (r.method() === 'POST' && kind) (sent[kind] ??= []).push(r.postDataJSON());
    });
    await page.goto(`/machines/${machineId}`);
    await page.getByRole('tab', { name: 'Frame' }).click();

    const diagonal = page.getByRole('form', { name: 'Diagonal check' });
    await diagonal.getByLabel('X side').fill('0');
    await diagonal.getByLabel('Y side').fill('1200');
    await diagonal.getByLabel(/^Diagonal 1/).fill('2332,15');
    await diagonal.getByLabel(/^Gantry span/).fill('-5');
    await diagonal.getByLabel(/^Read to/).fill('0');
    await diagonal.getByRole('button', { name: 'Record diagonal check' }).click();
    await expect(diagonal.getByLabel('X side')).toHaveAccessibleDescription(
      'X side must be a length greater than zero',
    );
    await expect(diagonal.getByLabel(/^Diagonal 2/)).toHaveAccessibleDescription(
      'Diagonal 2 must be a length greater than zero',
    );
    await expect(diagonal.getByLabel(/^Gantry span/)).toHaveAccessibleDescription(
      'Gantry span must be greater than zero, or left empty',
    );
    await expect(diagonal.getByLabel(/^Read to/)).toHaveAccessibleDescription(
      'Resolution must be greater than zero, or left empty',
    );
    // A decimal comma is a length; a field typed well keeps its hint.
    await expect(diagonal.getByLabel(/^Diagonal 1/)).toHaveAccessibleDescription('X0 Y0 corner to the far corner');
    await expect(diagonal.getByLabel('Y side')).toHaveAccessibleDescription('');
    // Put right, a field's message goes at once; the others stay until theirs are.
    await diagonal.getByLabel(/^Gantry span/).fill('');
    await expect(diagonal.getByLabel(/^Gantry span/)).toHaveAccessibleDescription(
      'Between the two drives; the X side when empty',
    );
    await expect(diagonal.getByLabel('X side')).toHaveAccessibleDescription(
      'X side must be a length greater than zero',
    );

    // Enter in a field sends the test cut, as the button does.
    const cut = page.getByRole('form', { name: 'Test cut' });
    await cut.getByLabel('Programmed X').fill('400');
    await cut.getByLabel('Kerf').fill('-0.1');
    await cut.getByLabel('Plate thickness').fill('0');
    await cut.getByLabel('Steps/mm X').fill('0');
    await cut.getByLabel('Programmed X').press('Enter');
    await expect(cut.getByLabel('Programmed Y')).toHaveAccessibleDescription(
      'Programmed Y must be a length greater than zero',
    );
    await expect(cut.getByLabel('Circle ⌀ along Y')).toHaveAccessibleDescription(
      'Circle ⌀ along Y must be a length greater than zero',
    );
    await expect(cut.getByLabel('Kerf')).toHaveAccessibleDescription('Kerf must be zero or more, or left empty');
    await expect(cut.getByLabel('Plate thickness')).toHaveAccessibleDescription(
      'Plate thickness must be greater than zero, or left empty',
    );
    await expect(cut.getByLabel('Steps/mm X')).toHaveAccessibleDescription(
      'Steps per mm X must be greater than zero, or left empty',
    );
    await expect(cut.getByLabel('Programmed X')).toHaveAccessibleDescription('');
    // A kerf of zero is a value (the compensation was exact): its hint comes back.
    await cut.getByLabel('Kerf').fill('0');
    await expect(cut.getByLabel('Kerf')).toHaveAccessibleDescription(
      'Width the controller did not compensate; empty when compensation was on',
    );
    expect(sent).toEqual({});

    // Put right, each is sent as typed: lengths in the chosen unit, empty optional fields left out.
    await diagonal.getByLabel('X side').fill('2000');
    await diagonal.getByLabel(/^Diagonal 2/).fill('2332.85');
    await diagonal.getByLabel(/^Read to/).fill('');
    await diagonal.getByRole('button', { name: 'Record diagonal check' }).click();
    await expect(page.getByTestId('squareness-result')).toBeVisible();
    expect(sent['diagonal-checks']).toEqual([
      { sideX: 2000, sideY: 1200, diagonal1: 2332.15, diagonal2: 2332.85, lengthUnit: 'mm' },
    ]);
    for (const [label, value] of [
      ['Programmed Y', '400'],
      [/^Circle ⌀\s*\*?$/, '100'],
      ['Measured X', '399.6'],
      ['Measured Y', '400.2'],
      [/^Diagonal 1/, '565.4'],
      [/^Diagonal 2/, '565.9'],
      ['Circle ⌀ along X', '99.7'],
      ['Circle ⌀ along Y', '99.9'],
      ['Plate thickness', '6'],
      ['Steps/mm X', '80'],
    ] as const)
      await cut.getByLabel(label).fill(value);
    await cut.getByLabel('Note').fill('  6 mm mild steel, 45 A  ');
    await cut.getByRole('button', { name: 'Record test cut' }).click();
    await expect.poll(() => sent['test-cuts']?.length).toBe(1);
    expect(sent['test-cuts']).toEqual([
      {
        lengthUnit: 'mm',
        plateThickness: 6,
        nominal: { x: 400, y: 400, circle: 100 },
        measured: { x: 399.6, y: 400.2, diagonal1: 565.4, diagonal2: 565.9, circleX: 99.7, circleY: 99.9, kerf: 0 },
        circleKind: 'hole',
        stepsPerMm: { x: 80 },
        note: '6 mm mild steel, 45 A',
      },
    ]);
  });

  test('the router shows its complete walk; builders record frame checks but not test cuts', async ({ page }) => {
    await signInAs(page, DEMO.builder);
    await openTab(page, 'Small router', 'Frame');
    await expect(page.getByRole('button', { name: 'Record diagonal check' })).toBeVisible();
    await expect(page.getByRole('button', { name: 'Record bed grid' })).toBeVisible();
    await expect(page.getByRole('button', { name: 'Record test cut' })).toHaveCount(0);
    await expect(page.getByRole('table', { name: 'Part sizes' })).toContainText('within');
    await expect(page.getByText(/routers are judged in tenths of a millimetre/).first()).toBeVisible();
    await page.getByRole('tab', { name: 'Safety walk' }).click();
    await expect(page.getByTestId('walk-status')).toHaveText('Complete');
    await expect(page.getByRole('button', { name: 'Yes' }).first()).toBeDisabled();
  });

  test('an owner adds a workshop item that every machine is asked', async ({ page }) => {
    await signInAs(page, DEMO.owner);
    await openTab(page, 'Big plasma table', 'Safety walk');
    const total = Number((await page.getByTestId('walk-counts').textContent())!.match(/of (\d+) answered/)![1]);
    await page.getByRole('button', { name: 'Add a workshop item' }).click();
    // Fewer than five characters: the button waits.
    await page.getByRole('dialog').getByLabel('What is checked').fill('Dry ');
    await expect(page.getByRole('dialog').getByRole('button', { name: 'Add item' })).toBeDisabled();
    await page.getByRole('dialog').getByLabel('What is checked').fill('The spare torch consumables are stored dry');
    await page.getByRole('dialog').getByRole('button', { name: 'Add item' }).click();
    const item = page.getByRole('group', { name: 'The spare torch consumables are stored dry' });
    await expect(item).toContainText('Not answered yet');
    await expect(item).toContainText('Workshop item');
    await expect(page.getByTestId('walk-counts')).toContainText(`of ${total + 1} answered`);
    await item.getByRole('button', { name: 'Not applicable' }).click();
    await expect(item).toContainText('Not applicable · Owen Pryce');
    // Asked on the other machine's walk too.
    await openTab(page, 'Small router', 'Safety walk');
    await expect(page.getByRole('group', { name: 'The spare torch consumables are stored dry' })).toBeVisible();
  });

  test('the frame page on a phone (390 px) and a laptop (1280 px)', async ({ page }) => {
    // Two page loads and six screenshots: more than one ordinary test's time.
    test.setTimeout(180_000);
    await signInAs(page, DEMO.technician);
    for (const [width, name] of [
      [390, 'phone'],
      [1280, 'laptop'],
    ] as const) {
      await page.setViewportSize({ width, height: 900 });
      await openTab(page, 'Big plasma table', 'Frame');
      await expect(page.getByTestId('flatness-result')).toContainText('Height range');
      await expect(page.getByRole('form', { name: 'Test cut' }).getByLabel('Length unit')).toBeVisible();
      // Nothing wider than the screen: the page itself does not scroll sideways (wide tables scroll in their own box).
      const offenders = await page.evaluate(() => {
        const width = document.documentElement.clientWidth;
        const inScroller = (el: Element) => {
          for (let p = el.parentElement; p; p = p.parentElement)
            if (p.scrollWidth > p.clientWidth && getComputedStyle(p).overflowX !== 'visible') return true;
          return false;
        };
        return [...document.querySelectorAll('main *')]
          .filter((el) => el.getBoundingClientRect().right > width + 1 && !inScroller(el))
          .slice(0, 5)
          .map(
            (el) =>
              `${el.tagName.toLowerCase()}.${[...el.classList].join('.')} "${(el.textContent ?? '').slice(0, 40)}"`,
          );
      });
      expect(offenders).toEqual([]);
      await shoot(page, 'section[aria-labelledby="bed-grid-title"]', `frame-bed-grid-${name}`);
      await shoot(page, 'section[aria-labelledby="test-cut-title"]', `frame-test-cut-${name}`);
      await snap(page, `frame-tab-${name}`);
    }
  });

  test('the drawing, the colour map and the walk at tablet size', async ({ page }) => {
    await page.setViewportSize({ width: 820, height: 1180 });
    await signInAs(page, DEMO.viewer);
    await openTab(page, 'Big plasma table', 'Frame');
    await expect(page.getByRole('img', { name: /Measured rectangle/ })).toBeVisible();
    await expect(page.getByRole('button', { name: 'Record diagonal check' })).toHaveCount(0);
    await expect(page.getByRole('figure', { name: 'Squaring history chart' })).toBeVisible();
    await shoot(page, 'section[aria-labelledby="diagonal-check-title"]', 'frame-diagonal-tablet');
    await shoot(page, 'section[aria-labelledby="bed-grid-title"]', 'frame-bed-grid-tablet');
    await snap(page, 'frame-tab-tablet');
    await page.getByRole('tab', { name: 'Safety walk' }).click();
    await expect(page.getByText('Technicians, owners and admins answer the walk.')).toBeVisible();
    await snap(page, 'safety-walk-tablet');
  });
});
