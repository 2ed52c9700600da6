import { expect, test, type Locator, type Page } from '@playwright/test';
import { DEMO, signInAs, snap } from './support/session';

// Charts read at a glance: the axes carry round ticks (one step of 1, 2 or 5 × 10^k, every tick
// a whole number of steps, as d3-scale's `nice` ticks are), and the sweep, partner and
// positioning charts shade the target zone, labelled with its width and unit.

/** True when the ticks are evenly spaced by 1, 2 or 5 × 10^k and each is a multiple of that step. */
function roundTicks(ticks: number[]): { ok: boolean; step: number } {
  if (ticks.length < 2) return { ok: false, step: NaN };
  const step = ticks[1] - ticks[0];
  const k = Math.floor(Math.log10(step) + 1e-9);
  const mantissa = step / 10 ** k;
  const roundStep = [1, 2, 5, 10].some((m) => Math.abs(mantissa - m) < 1e-6);
  const even = ticks.every((t, i) => i === 0 || Math.abs(t - ticks[i - 1] - step) < step * 1e-6);
  const onSteps = ticks.every((t) => Math.abs(t / step - Math.round(t / step)) < 1e-6);
  return { ok: roundStep && even && onSteps, step };
}

async function axisTicks(figure: Locator, axis: 'x' | 'y'): Promise<number[]> {
  const texts = await figure
    .locator(`.recharts-${axis}Axis-tick-labels .recharts-cartesian-axis-tick-value`)
    .allTextContents();
  return texts.map((t) => Number(t.replace('−', '-')));
}

async function expectRoundAxes(figure: Locator, name: string) {
  await expect(figure.locator('.recharts-yAxis-tick-labels .recharts-cartesian-axis-tick-value').first()).toBeVisible();
  for (const axis of ['x', 'y'] as const) {
    const ticks = await axisTicks(figure, axis);
    expect(ticks.length, `${name} ${axis} axis has ticks`).toBeGreaterThanOrEqual(2);
    expect(ticks.every(Number.isFinite), `${name} ${axis} ticks are numbers: ${ticks.join(', ')}`).toBe(true);
    expect(roundTicks(ticks).ok, `${name} ${axis} ticks are round: ${ticks.join(', ')}`).toBe(true);
  }
}

/** The shaded zone is drawn (a reference area, or the straightness chart's sloped area) and labelled. */
async function expectTargetBand(figure: Locator, label: RegExp) {
  await expect(figure.getByText(label).first()).toBeVisible();
  const drawn = await figure.locator('.recharts-reference-area-rect, .recharts-area-area').count();
  expect(drawn).toBeGreaterThan(0);
}

async function plasma(page: Page) {
  const machines: { id: string; name: string }[] = await (await page.request.get('/api/machines')).json();
  const m = machines.find((x) => x.name === 'Big plasma table')!;
  const rails: { id: string; label: string }[] = await (await page.request.get(`/api/machines/${m.id}/rails`)).json();
  const axes: { id: string; name: string }[] = await (await page.request.get(`/api/machines/${m.id}/axes`)).json();
  return { id: m.id, rails, axes };
}

test('sweep and partner charts: round ticks and the target zone', async ({ page }) => {
  await signInAs(page, DEMO.owner);
  const m = await plasma(page);
  const y2 = m.rails.find((r) => r.label === 'Y2 (right)')!;
  await page.goto(`/machines/${m.id}/rails/${y2.id}`);

  const overlay = page.getByRole('figure', { name: 'Sweeps overlaid' });
  await expect(overlay).toBeVisible();
  await expectRoundAxes(overlay, 'sweep overlay');
  await expectTargetBand(overlay, /^Target zone [\d.]+ (mm|µm|in|thou) wide$/);

  const partner = page.getByRole('figure', { name: 'Partner rail differences' });
  await expect(partner).toBeVisible();
  await expectRoundAxes(partner, 'partner chart');
  // The label names the same target as the summary above the chart.
  const summary = await page.getByRole('region', { name: /^Parallelism/ }).textContent();
  const target = /target ([\d.]+ (?:mm|µm|in|thou))/.exec(summary ?? '')?.[1];
  expect(target, 'the summary names the parallelism target').toBeTruthy();
  await expectTargetBand(partner, new RegExp(`^Parallelism target ${target!.replace('.', '\\.')} wide$`));

  // The zone is as wide as the target: its drawn height over the y axis' scale (both in SVG units) gives its width.
  const ticks = await axisTicks(partner, 'y');
  const tickY = (await partner
    .locator('.recharts-yAxis-tick-lines line')
    .evaluateAll((els) => els.map((e) => Number(e.getAttribute('y1'))))) as number[];
  const unitsPerPx = Math.abs(ticks[ticks.length - 1] - ticks[0]) / Math.abs(tickY[tickY.length - 1] - tickY[0]);
  const bandPx = Number(await partner.locator('.recharts-reference-area-rect').first().getAttribute('height'));
  expect(bandPx * unitsPerPx).toBeCloseTo(Number(target!.split(' ')[0]), 3);
  await snap(page, 'charts-sweep-partner');
});

test('repeat-and-reverse chart: round ticks and the accuracy target zone', async ({ page }) => {
  await signInAs(page, DEMO.owner);
  const m = await plasma(page);
  let found = false;
  for (const axis of m.axes) {
    const runs: unknown[] = await (await page.request.get(`/api/axes/${axis.id}/positioning-runs?limit=1`)).json();
    if (!runs.length) continue;
    await page.goto(`/machines/${m.id}/axes/${axis.id}`);
    const chart = page.getByRole('figure', { name: /^Mean deviations up and down/ }).first();
    await expect(chart).toBeVisible();
    await expectRoundAxes(chart, `axis ${axis.name} positioning`);
    const result = page.getByRole('region', { name: 'Repeat-and-reverse result' }).first();
    const target = /Positioning accuracy A[\s\S]*?target ≤ ([\d.]+ (?:mm|µm|in|thou))/.exec(
      (await result.textContent()) ?? '',
    )?.[1];
    expect(target).toBeTruthy();
    await expectTargetBand(chart, new RegExp(`^Accuracy target ${target!.replace('.', '\\.')} wide$`));
    await snap(page, 'charts-positioning');
    found = true;
    break;
  }
  expect(found, 'a demo axis has a repeat-and-reverse run').toBe(true);
});

test('straightness calculator: round ticks on odd readings', async ({ page }) => {
  await signInAs(page, DEMO.owner);
  await page.goto('/calculators?calc=straightness');
  // Readings that used to give ticks such as −0.44, 1.56, 3.56.
  await page
    .getByLabel('Stations and readings')
    .fill(['0\t-0.44', '37\t1.56', '81\t3.56', '133\t2.07', '171\t0.93'].join('\n'));
  const chart = page.getByRole('figure', { name: 'Straightness chart' });
  await expect(chart).toBeVisible();
  await expectRoundAxes(chart, 'straightness calculator');
});

test('the shared axis helper: round ends and steps for awkward spans', async () => {
  const { niceAxis } = await import('../frontend/src/components/charts/nice-axis');
  // d3-scale's own documented behaviour (d3-scale README, "linear.nice"): [0.201479, 0.996679] → [0.2, 1].
  expect(niceAxis([0.201479, 0.996679]).domain).toEqual([0.2, 1]);
  for (const values of [[-0.44, 1.56, 3.56], [0.0013, 0.0071], [-25.4, 1270], [7, 7], []]) {
    const { domain, ticks } = niceAxis(values);
    expect(roundTicks(ticks).ok, `${values.join(', ')} → ${ticks.join(', ')}`).toBe(true);
    expect(domain[0]).toBeLessThanOrEqual(Math.min(...values, domain[1]));
    expect(domain[1]).toBeGreaterThanOrEqual(Math.max(...values, domain[0]));
    expect(
      ticks.map(String).every((t) => t.length <= 8),
      `no float noise in ${ticks.join(', ')}`,
    ).toBe(true);
  }
});
