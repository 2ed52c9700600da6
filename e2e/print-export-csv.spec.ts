import { expect, test, type Page } from '@playwright/test';
import { readFileSync } from 'node:fs';
import Papa from 'papaparse';
import { DEMO, signInAs } from './support/session';
import { demoPlasma } from './support/demo-plasma';

// "Download CSV" beside a rail's sweeps, an axis's trials and runs and a machine's bed grids: the
// file parses as CSV, names each column's unit, gives times in ISO 8601 with their zone, and
// holds exactly the values the API (and so the page) shows.

const MM: Record<string, number> = { mm: 1, um: 0.001, in: 25.4, thou: 0.0254 };
const NAMES: Record<string, string> = { mm: 'mm', um: 'µm', in: 'in', thou: 'thou' };
const ISO_UTC = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}Z$/;

type Row = Record<string, string>;

/** Clicks `open` (and then the menu item, if any) and parses the file the browser saves. */
async function download(
  page: Page,
  open: () => Promise<void>,
): Promise<{ name: string; text: string; rows: Row[]; fields: string[] }> {
  const [file] = await Promise.all([page.waitForEvent('download'), open()]);
  const text = readFileSync((await file.path())!, 'utf8');
  const parsed = Papa.parse<Row>(text, { header: true, skipEmptyLines: true });
  expect(parsed.errors).toEqual([]);
  return { name: file.suggestedFilename(), text, rows: parsed.data, fields: parsed.meta.fields ?? [] };
}

// Files give ten significant digits.
const close = (a: string, b: number) =>
  expect(Math.abs(Number(a) - b)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(b)));
const sameSecond = (csv: string, iso: string) =>
  expect(csv).toBe(new Date(iso).toISOString().replace(/\.\d{3}Z$/, 'Z'));

test("sweeps of a rail: one row per reading, in the newest sweep's units", async ({ page }) => {
  await signInAs(page, DEMO.viewer);
  const m = await demoPlasma(page);
  await page.goto(`/machines/${m.id}/rails/${m.rail.id}`);
  const file = await download(page, () =>
    page.getByRole('link', { name: `Download CSV: Sweeps of rail ${m.rail.label}` }).click(),
  );
  expect(file.name).toBe('rail-y2-right-sweeps.csv');
  expect(file.text.startsWith('Sweep,Taken at,')).toBe(true); // a plain file: no mark or note before the header
  expect(file.text.endsWith('\r\n')).toBe(true);

  const list: { id: string }[] = await (await page.request.get(`/api/rails/${m.rail.id}/sweeps?limit=50`)).json();
  const sweeps = await Promise.all(list.map(async (s) => (await page.request.get(`/api/sweeps/${s.id}`)).json()));
  const [L, R] = [sweeps[0].lengthUnit, sweeps[0].readingUnit];
  expect(file.fields).toContain(`Position (${NAMES[L]})`);
  expect(file.fields).toContain(`Reading (${NAMES[R]})`);
  expect(file.rows).toHaveLength(sweeps.reduce((n, s) => n + s.stations.length, 0));

  for (const s of sweeps) {
    const rows = file.rows.filter((r) => r.Sweep === s.id);
    expect(rows).toHaveLength(s.stations.length);
    rows.forEach((r, i) => {
      expect(r['Taken at']).toMatch(ISO_UTC);
      sameSecond(r['Taken at'], s.takenAt);
      close(r[`Position (${NAMES[L]})`], s.stations[i].positionMm / MM[L]);
      close(r[`Reading (${NAMES[R]})`], s.stations[i].readingMm / MM[R]);
      close(r[`Straightness, least squares (${NAMES[R]})`], s.result.leastSquares.straightness / MM[R]);
      expect(r.Status).toBe(s.status.replace('-', ' '));
      expect(r.Phase).toBe(s.phase.replace('-', ' '));
    });
  }
});

test('travel trials and repeat-and-reverse runs of an axis', async ({ page }) => {
  await signInAs(page, DEMO.technician);
  const m = await demoPlasma(page);
  await page.goto(`/machines/${m.id}/axes/${m.axis.id}`);

  const pick = (item: string) => async () => {
    await page.getByRole('button', { name: 'Download CSV' }).click();
    await page.getByRole('menuitem', { name: item }).click();
  };
  const trialsFile = await download(page, pick(`Travel trials of axis ${m.axis.name}`));
  expect(trialsFile.name).toBe('axis-x-travel-trials.csv');
  const trialList: { id: string }[] = await (
    await page.request.get(`/api/axes/${m.axis.id}/travel-trials?limit=50`)
  ).json();
  const trials = await Promise.all(
    trialList.map(async (t) => (await page.request.get(`/api/axes/${m.axis.id}/travel-trials/${t.id}`)).json()),
  );
  const L = trials[0].lengthUnit;
  expect(trialsFile.rows).toHaveLength(trials.reduce((n, t) => n + t.moves.length, 0));
  for (const t of trials) {
    const rows = trialsFile.rows.filter((r) => r.Trial === t.id);
    rows.forEach((r, i) => {
      sameSecond(r['Recorded at'], t.recordedAt);
      close(r[`Commanded (${NAMES[L]})`], (t.moves[i].commanded * MM[t.lengthUnit]) / MM[L]);
      close(r[`Measured (${NAMES[L]})`], (t.moves[i].measured * MM[t.lengthUnit]) / MM[L]);
      expect(Number(r['Corrected steps per mm'])).toBeCloseTo(t.result.correctedStepsPerMm, 6);
    });
  }

  const runsFile = await download(page, pick(`Repeat-and-reverse runs of axis ${m.axis.name}`));
  expect(runsFile.name).toBe('axis-x-repeat-and-reverse-runs.csv');
  const runList: { id: string }[] = await (
    await page.request.get(`/api/axes/${m.axis.id}/positioning-runs?limit=50`)
  ).json();
  const runs = await Promise.all(
    runList.map(async (r) => (await page.request.get(`/api/axes/${m.axis.id}/positioning-runs/${r.id}`)).json()),
  );
  const R = runs[0].readingUnit;
  expect(runsFile.fields).toContain(`Deviation (${NAMES[R]})`);
  expect(runsFile.rows).toHaveLength(runs.reduce((n, r) => n + r.runs.length * r.targets.length, 0));
  const first = runs[0];
  const rows = runsFile.rows.filter((r) => r.Run === first.id);
  first.runs.forEach((pass: { direction: string; deviations: number[] }, p: number) =>
    pass.deviations.forEach((d, i) => {
      const row = rows[p * first.targets.length + i];
      expect(row.Direction).toBe(pass.direction);
      close(row[`Deviation (${NAMES[R]})`], (d * MM[first.readingUnit]) / MM[R]);
      close(row[`Target position (${NAMES[first.lengthUnit]})`], first.targets[i]);
    }),
  );
});

test('bed grids of a machine', async ({ page }) => {
  await signInAs(page, DEMO.owner);
  const m = await demoPlasma(page);
  await page.goto(`/machines/${m.id}?tab=frame`);
  const file = await download(page, () =>
    page.getByRole('link', { name: 'Download CSV: Bed grids of Big plasma table' }).click(),
  );
  expect(file.name).toBe('big-plasma-table-bed-grids.csv');
  const grids: {
    id: string;
    readingUnit: string;
    lengthUnit: string;
    recordedAt: string;
    points: { x: number; y: number; z: number }[];
  }[] = await (await page.request.get(`/api/machines/${m.id}/bed-grids`)).json();
  expect(grids.length).toBeGreaterThan(0);
  expect(file.rows).toHaveLength(grids.reduce((n, g) => n + g.points.length, 0));
  const newest = [...grids].sort((a, b) => b.recordedAt.localeCompare(a.recordedAt))[0];
  const [L, R] = [newest.lengthUnit, newest.readingUnit];
  for (const g of grids) {
    file.rows
      .filter((r) => r['Bed grid'] === g.id)
      .forEach((r, i) => {
        sameSecond(r['Recorded at'], g.recordedAt);
        close(r[`X (${NAMES[L]})`], (g.points[i].x * MM[g.lengthUnit]) / MM[L]);
        close(r[`Height (${NAMES[R]})`], (g.points[i].z * MM[g.readingUnit]) / MM[R]);
      });
  }
});
