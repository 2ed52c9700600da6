import { boltCircleHoles, gridHoles, type Hole } from '../geometry/pattern-holes.js';
import { contentStreams, readPdfPages, type ReadPage } from './pdf-readback.test-support.js';
import { layoutSheets, OVERLAP_MM } from './sheet-layout.js';
import { renderTemplatePdf } from './template-pdf.js';
import type { TemplateInput } from './template-drawing.js';

// 72 points to the inch (PDF 1.7, ISO 32000-1 §8.3.2.3: default user space unit is 1/72 inch) and
// 25.4 mm to the inch exactly (international inch, 1959).
const K = 72 / 25.4;
const TOLERANCE_MM = 0.01;

const bracket: TemplateInput = {
  title: 'Y1 motor bracket',
  machineName: 'Test table',
  details: [],
  widthMm: 120,
  heightMm: 90,
  reference: 'bottom-left',
  unit: 'mm',
  holes: [
    ...boltCircleHoles({
      centreXMm: 60,
      centreYMm: 45,
      circleDiameterMm: 66.68,
      count: 4,
      startAngleDeg: 45,
      diameterMm: 5.5,
    }),
    { xMm: 60, yMm: 45, diameterMm: 38.1 },
    ...gridHoles({ originXMm: 8, originYMm: 8, rows: 2, columns: 2, pitchXMm: 104, pitchYMm: 74, diameterMm: 6.6 }),
  ],
};

const longRail: TemplateInput = {
  title: 'Rail X1',
  machineName: 'Test table',
  details: [],
  widthMm: 1530,
  heightMm: 23,
  reference: 'left',
  unit: 'mm',
  holes: Array.from({ length: 26 }, (_, k) => ({ xMm: 20 + 60 * k, yMm: 11.5, diameterMm: 5 })),
};

/** Each crosshair read off the page, in pattern mm, measured from the outline drawn on that page. */
function measuredHoles(page: ReadPage, input: TemplateInput) {
  const outline = page.outlines.find(
    (o) => Math.abs(o.x1 - o.x0 - input.widthMm * K) < 0.02 && Math.abs(o.y1 - o.y0 - input.heightMm * K) < 0.02,
  );
  if (!outline) throw new Error('no outline of the pattern’s size on the page');
  return page.crosshairs.map((c) => ({ xMm: (c.x - outline.x0) / K, yMm: (outline.y1 - c.y) / K, page: c }));
}

function nearest(holes: Hole[], p: { xMm: number; yMm: number }) {
  return Math.min(...holes.map((h) => Math.hypot(h.xMm - p.xMm, h.yMm - p.yMm)));
}

describe('template PDF read back through poppler', () => {
  it('puts every hole centre of a one-sheet bracket within 0.01 mm of the pattern, measured from the printed outline', async () => {
    const pdf = await renderTemplatePdf(bracket, layoutSheets(bracket.widthMm, bracket.heightMm, 'a4'));
    const [page, ...rest] = readPdfPages(pdf);
    expect(rest).toHaveLength(0);
    const found = measuredHoles(page, bracket);
    expect(found).toHaveLength(bracket.holes.length);
    let worst = 0;
    for (const hole of bracket.holes) {
      const error = nearest(
        found.map((f) => ({ xMm: f.xMm, yMm: f.yMm, diameterMm: 0 })),
        hole,
      );
      worst = Math.max(worst, error);
    }
    expect(worst).toBeLessThan(TOLERANCE_MM);
  });

  it('draws a 100 mm and a 4 in bar on every sheet, 283.46 pt and 288 pt long (72 / 25.4 points per mm)', async () => {
    const pdf = await renderTemplatePdf(longRail, layoutSheets(longRail.widthMm, longRail.heightMm, 'letter'));
    const pages = readPdfPages(pdf);
    expect(pages.length).toBeGreaterThan(1);
    for (const page of pages) {
      const lengths = page.bars.map((b) => b.x1 - b.x0).sort((a, b) => a - b);
      expect(lengths).toHaveLength(2);
      // Cairo keeps 1/256 pt: each end within 1/512 pt, so the length within 1/256 pt (0.0014 mm).
      expect(Math.abs(lengths[0] - 100 * K)).toBeLessThanOrEqual(1 / 256);
      expect(Math.abs(lengths[1] - 101.6 * K)).toBeLessThanOrEqual(1 / 256);
    }
    // As written by pdfkit (6 decimals): each bar's segment from x to x + length, exact to 1e-6 pt.
    const streams = contentStreams(pdf);
    for (const s of streams) {
      const bars = [...s.matchAll(/0\.6 w\n([\d.]+) ([\d.]+) m\n([\d.]+) ([\d.]+) l\n/g)].map((m) => ({
        len: Number(m[3]) - Number(m[1]),
      }));
      expect(bars.map((b) => b.len).sort((a, b) => a - b)).toEqual([
        expect.closeTo(283.464567, 6),
        expect.closeTo(288, 6),
      ]);
    }
  });

  it('tiles a long rail over sheets that cover the whole outline, overlap by 20 mm and show every hole where it belongs', async () => {
    const layout = layoutSheets(longRail.widthMm, longRail.heightMm, 'a4');
    const pdf = await renderTemplatePdf(longRail, layout);
    const pages = readPdfPages(pdf);
    expect(pages).toHaveLength(layout.sheets.length);
    const windows: { x0: number; x1: number; y0: number; y1: number }[] = [];
    const seen = new Set<number>();
    let worst = 0;
    for (const page of pages) {
      const outline = page.outlines[0];
      expect(page.frames).toHaveLength(1);
      const f = page.frames[0];
      // The sheet's window in pattern mm, measured from the outline printed on the same sheet.
      const win = {
        x0: (f.x0 - outline.x0) / K,
        x1: (f.x1 - outline.x0) / K,
        y0: (outline.y1 - f.y1) / K,
        y1: (outline.y1 - f.y0) / K,
      };
      windows.push(win);
      for (const m of measuredHoles(page, longRail)) {
        const index = longRail.holes.findIndex((h) => Math.hypot(h.xMm - m.xMm, h.yMm - m.yMm) < 1);
        expect(index).toBeGreaterThanOrEqual(0);
        const h = longRail.holes[index];
        worst = Math.max(worst, Math.hypot(h.xMm - m.xMm, h.yMm - m.yMm));
        if (m.xMm >= win.x0 && m.xMm <= win.x1 && m.yMm >= win.y0 && m.yMm <= win.y1) seen.add(index);
      }
    }
    expect(worst).toBeLessThan(TOLERANCE_MM);
    expect(seen.size).toBe(longRail.holes.length);
    // One row: windows side by side, each overlapping the next by 20 mm, the first starting before
    // the outline and the last ending after it.
    windows.sort((a, b) => a.x0 - b.x0);
    expect(windows[0].x0).toBeLessThan(0);
    expect(windows[windows.length - 1].x1).toBeGreaterThan(longRail.widthMm);
    for (let i = 1; i < windows.length; i++) expect(windows[i - 1].x1 - windows[i].x0).toBeCloseTo(OVERLAP_MM, 2);
    for (const w of windows) expect(w.y0 <= 0 && w.y1 >= longRail.heightMm).toBe(true);
  });

  it('tiles a large plate in rows and columns that together cover it', async () => {
    const plate: TemplateInput = {
      ...bracket,
      widthMm: 400,
      heightMm: 300,
      holes: gridHoles({
        originXMm: 20,
        originYMm: 20,
        rows: 3,
        columns: 4,
        pitchXMm: 120,
        pitchYMm: 130,
        diameterMm: 8,
      }),
    };
    const layout = layoutSheets(plate.widthMm, plate.heightMm, 'a4');
    expect(layout.rows).toBeGreaterThan(1);
    expect(layout.columns).toBeGreaterThan(1);
    const pages = readPdfPages(await renderTemplatePdf(plate, layout));
    expect(pages).toHaveLength(layout.sheets.length);
    // Sample the outline on a 5 mm lattice: every point lies in some sheet's window.
    const windows = pages.map((page) => {
      const o = page.outlines[0];
      const f = page.frames[0];
      return { x0: (f.x0 - o.x0) / K, x1: (f.x1 - o.x0) / K, y0: (o.y1 - f.y1) / K, y1: (o.y1 - f.y0) / K };
    });
    for (let x = 0; x <= plate.widthMm; x += 5) {
      for (let y = 0; y <= plate.heightMm; y += 5) {
        expect(windows.some((w) => x >= w.x0 && x <= w.x1 && y >= w.y0 && y <= w.y1)).toBe(true);
      }
    }
  });
});
