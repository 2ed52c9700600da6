import { expect, test, type Page } from '@playwright/test';
import { DEMO, signInAs } from './support/session';
import { newMachineWithRail } from './support/machine-with-rail';

/**
 * The sweep form on a slow tablet. React reports every commit to a developer-tools hook when one
 * is present; the page gets a counting stand-in before it loads, so the form is measured as
 * shipped, without any test code inside the app.
 *
 * Asserted: a sweep form with 45 readings and a drawn chart commits nothing while nobody types,
 * and a keystroke in a reading re-renders that reading alone, and only when its problem changes.
 * Printed (timings are noisy on a shared machine; the goal lives in the bench): keystroke-to-paint
 * at CPU ×4 (p50, p90, worst) over typed keystrokes.
 */

declare global {
  interface Window {
    __railwrightCommits: number;
    __railwrightKeyToPaint: number[];
    /** While set, the count of components each commit rendered is pushed here. */
    __railwrightRenders?: number[];
  }
}

const STATIONS = 45;

async function countCommits(page: Page) {
  await page.addInitScript(() => {
    type Fiber = { flags: number; type: unknown; child: Fiber | null; sibling: Fiber | null; alternate: Fiber | null };
    // A component ran in a commit when React marked its fiber with PerformedWork (flag 1); a
    // subtree whose children are still the ones on screen was skipped whole and is not walked.
    const rendered = (first: Fiber | null): number => {
      let n = 0;
      for (let f = first; f; f = f.sibling) {
        const component = typeof f.type === 'function' || (typeof f.type === 'object' && f.type !== null);
        if (component && (f.flags & 1) === 1) n++;
        if (f.child && f.child !== f.alternate?.child) n += rendered(f.child);
      }
      return n;
    };
    window.__railwrightCommits = 0;
    const renderers = new Map<number, unknown>();
    (window as unknown as Record<string, unknown>).__REACT_DEVTOOLS_GLOBAL_HOOK__ = {
      renderers,
      supportsFiber: true,
      inject: (renderer: unknown) => {
        renderers.set(renderers.size + 1, renderer);
        return renderers.size;
      },
      onScheduleFiberRoot: () => {},
      onCommitFiberRoot: (_id: number, root: { current: Fiber }) => {
        window.__railwrightCommits++;
        window.__railwrightRenders?.push(rendered(root.current));
      },
      onCommitFiberUnmount: () => {},
      onPostCommitFiberRoot: () => {},
      checkDCE: () => {},
    };
  });
}

/** A machine with one 2250 mm rail, holes every 50 mm from 25 mm: 45 stations. */
const railWith45Stations = (page: Page) =>
  newMachineWithRail(
    page,
    `Typing table ${Date.now()}`,
    { lengthMm: 2250, holePitchMm: 50, firstHoleMm: 25 },
    { x: 3000, y: 2400 },
  );

const position = (i: number) => 25 + 50 * i;
// A gently bowed rail with a little noise: readings in thou.
const reading = (i: number) => (0.004 * (i - 22) ** 2 + ((i * 7) % 5) * 0.1).toFixed(1);

async function fillReadings(page: Page) {
  const table = page.getByRole('table', { name: 'Stations and readings' });
  await expect(table.getByRole('row')).toHaveCount(STATIONS + 1);
  for (let i = 0; i < STATIONS; i++) await page.getByLabel(`Reading at ${position(i)} mm`).fill(reading(i));
  await expect(
    page.getByRole('figure', { name: 'Live straightness chart' }).locator('.recharts-line-dots circle').first(),
  ).toBeVisible();
  await expect(page.getByRole('region', { name: 'New sweep' }).getByText(`${STATIONS} readings`)).toBeVisible();
}

const percentile = (sorted: number[], p: number) =>
  sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)];

test.describe('typing on a slow tablet', () => {
  // Forty-five fields are filled one by one, each asking for a fit: slow on a busy shared machine.
  test.describe.configure({ timeout: 180_000 });
  test.beforeEach(async ({ page }) => {
    await countCommits(page);
    await signInAs(page, DEMO.builder);
    await railWith45Stations(page);
  });

  test('an idle sweep form with 45 readings and its chart does not re-render', async ({ page }) => {
    await fillReadings(page);
    // Let the last fit arrive and the chart settle, then watch two seconds of idleness.
    await page.waitForTimeout(1500);
    const hooked = await page.evaluate(() => window.__railwrightCommits);
    expect(hooked, 'the commit counter saw the form being built').toBeGreaterThan(STATIONS);
    const before = await page.evaluate(() => window.__railwrightCommits);
    await page.waitForTimeout(2000);
    const idleCommits = (await page.evaluate(() => window.__railwrightCommits)) - before;
    console.log(`sweep form idle for 2 s with ${STATIONS} readings: ${idleCommits} React commits`);
    expect(idleCommits).toBe(0);
  });

  test('a keystroke in one reading re-renders that reading at most, not the table', async ({ page }) => {
    await fillReadings(page);
    await page.waitForTimeout(1500);
    const field = page.getByLabel(`Reading at ${position(20)} mm`);
    await field.click();
    await field.press('End');
    const rendersWhileTyping = async (keys: string[]) => {
      await page.evaluate(() => (window.__railwrightRenders = []));
      // Quicker than the fit waits for, so only the keystrokes themselves commit.
      for (const key of keys) await page.keyboard.press(key);
      return page.evaluate(() => {
        const counts = window.__railwrightRenders ?? [];
        window.__railwrightRenders = undefined;
        return counts;
      });
    };
    // The field keeps what is typed: a reading that stays a number re-renders nothing.
    const plain = await rendersWhileTyping(['5', 'Backspace', '5']);
    console.log(`components rendered per commit while correcting one reading: ${plain.join(', ') || 'none'}`);
    expect(plain).toEqual([]);
    await expect(field).toHaveValue(`${reading(20)}5`);
    // A letter makes it a reading to fix and Backspace mends it: the field's message and the count change.
    const fixing = await rendersWhileTyping(['x', 'Backspace']);
    console.log(`components rendered per commit while a reading turns wrong and back: ${fixing.join(', ')}`);
    // (A commit that renders nothing may follow; the counter must see both keystrokes render the field.)
    expect(fixing.filter((n) => n > 0).length, 'both keystrokes rendered the field').toBeGreaterThanOrEqual(2);
    // One station's field is a few dozen components; the table alone would be more than one per station.
    expect(Math.max(...fixing)).toBeLessThan(STATIONS);
    await expect(field).toHaveValue(`${reading(20)}5`);
    await expect(page.getByText('Reading is not a number')).toHaveCount(0);
  });

  test('keystroke-to-paint at CPU ×4 with 45 readings (printed)', async ({ page }) => {
    await fillReadings(page);
    await page.waitForTimeout(1000);
    const cdp = await page.context().newCDPSession(page);
    await cdp.send('Emulation.setCPUThrottlingRate', { rate: 4 });
    try {
      // From the keydown's time stamp to the first moment after the next frame is painted.
      await page.evaluate(() => {
        window.__railwrightKeyToPaint = [];
        window.addEventListener(
          'keydown',
          (e) => {
            const t0 = e.timeStamp;
            requestAnimationFrame(() => {
              const channel = new MessageChannel();
              channel.port1.onmessage = () => window.__railwrightKeyToPaint.push(performance.now() - t0);
              channel.port2.postMessage(null);
            });
          },
          true,
        );
      });
      const commitsBefore = await page.evaluate(() => window.__railwrightCommits);
      // Correct three readings the way a builder does: select, type a new value, move on.
      for (const i of [10, 30, 44]) {
        const field = page.getByLabel(`Reading at ${position(i)} mm`);
        await field.click();
        await field.press('Control+a');
        for (const key of ['1', '.', '2', '5', 'Backspace', '7']) {
          await page.keyboard.press(key);
          await page.waitForTimeout(180); // a quick hand at the keys
        }
      }
      await page.waitForTimeout(1200);
      const times = (await page.evaluate(() => window.__railwrightKeyToPaint)).sort((a, b) => a - b);
      const commits = (await page.evaluate(() => window.__railwrightCommits)) - commitsBefore;
      console.log(
        `keystroke-to-paint at CPU ×4, ${STATIONS} readings, ${times.length} keys: p50 ${percentile(times, 50).toFixed(0)} ms, ` +
          `p90 ${percentile(times, 90).toFixed(0)} ms, worst ${times[times.length - 1].toFixed(0)} ms (goal p90 < 50 ms; ${commits} commits while typing)`,
      );
      expect(times.length).toBeGreaterThanOrEqual(18);
    } finally {
      await cdp.send('Emulation.setCPUThrottlingRate', { rate: 1 });
    }
  });
});
