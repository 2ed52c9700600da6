import { expect, test } from '@playwright/test';
import { cellProblem, normaliseCell, parseNumberCell, readRows } from '../frontend/src/lib/tabular-input';
import { parseSweepCsv } from '../frontend/src/features/rails/utils/parse-sweep-csv';
import { parseRunsCsv, splitRows } from '../frontend/src/features/drives/utils/parse-grid';
import { pastedHeights } from '../frontend/src/features/frame/utils/pasted-heights';

// Every way a table of numbers comes in (a rail sweep's CSV, a repeat-and-reverse file, a block
// pasted into the drives' grids, a block pasted into the bed grid) reads the same text alike.
// Runs in Node: no page is opened.

const EXPECTED = [[0, 0], [200, 0.5], [400, -1.25], [600, 0.5]];

const TRICKY: Record<string, string> = {
  'semicolon CSV with decimal commas and a typographic minus': '0;0\r\n200;0,5\r\n400;\u22121,25\r\n600;+0,5\r\n',
  'tab-separated paste from a spreadsheet': '0\t0\n200\t0,5\n400\t-1,25\n600\t0.5\n',
  'quoted fields in a comma CSV': '"0","0"\n"200","0,5"\n400,"-1.25"\n"600",0.5\n',
  'blank lines and a comment between rows': '\uFEFF0, 0\n\n200, 0.5\n# moved the stand\n400, -1.25\n   \n600, 0.5',
  'columns lined up with spaces': '  0    0\n200  0.5\n400  -1.25\n600  0.5\n',
};

const byEntry: Record<string, (text: string) => (number | null)[][]> = {
  'rail sweep CSV': (text) => {
    const parsed = parseSweepCsv(text);
    expect(parsed.rows.filter((r) => r.problem)).toEqual([]);
    return parsed.rows.map((r) => [r.position, r.reading]);
  },
  'repeat-and-reverse file': (text) => {
    const parsed = parseRunsCsv(text);
    expect(parsed.problems).toEqual([]);
    return parsed.rows.map((r) => r.values);
  },
  'paste into a drives grid': (text) => splitRows(text).map((cells) => cells.map(Number)),
  'paste into the bed grid': (text) => {
    const flat = pastedHeights(text).map(Number);
    return Array.from({ length: flat.length / 2 }, (_, i) => flat.slice(i * 2, i * 2 + 2));
  },
};

test.describe('pasted and uploaded tables', () => {
  for (const [name, text] of Object.entries(TRICKY)) {
    test(`${name}: every entry point reads the same numbers`, () => {
      for (const [entry, read] of Object.entries(byEntry)) expect(read(text), entry).toEqual(EXPECTED);
    });
  }

  test('a bad cell is named by its line and column everywhere, and never guessed', () => {
    const text = '0;0\n\n200;1.234,5\n400;abc\n';
    const sweep = parseSweepCsv(text);
    expect(sweep.rows.map((r) => [r.line, r.problem])).toEqual([
      [1, null],
      [3, 'Reading "1.234,5" has both a point and a comma; write it without a thousands separator, with one decimal mark'],
      [4, 'Reading "abc" is not a number'],
    ]);
    expect(parseRunsCsv(text).problems).toEqual([
      'Line 3, column 2: "1.234,5" has both a point and a comma; write it without a thousands separator, with one decimal mark',
      'Line 4, column 2: "abc" is not a number',
    ]);
    // The grids keep the cell as typed and flag it themselves.
    expect(splitRows(text)[1]).toEqual(['200', '1.234,5']);
    expect(pastedHeights(text).slice(2, 4)).toEqual(['200', '1.234,5']);
  });

  test('one number parser: decimal point or comma, a sign, no thousands separators', () => {
    const value = (t: string) => {
      const p = parseNumberCell(t);
      return p.ok ? p.value : p.reason;
    };
    expect(value('')).toBeNull();
    expect(value(' 0,012 ')).toBe(0.012);
    expect(value('+1.5')).toBe(1.5);
    expect(value('\u22120,5')).toBe(-0.5);
    expect(value('-.25')).toBe(-0.25);
    expect(value('1.5e-3')).toBe(0.0015);
    expect(value('-0')).toBe(0);
    // A single comma is a decimal comma (semicolon- and tab-separated text, quoted cells).
    expect(value('1,234')).toBe(1.234);
    expect(value('1,234.5')).toBe('"1,234.5" has both a point and a comma; write it without a thousands separator, with one decimal mark');
    expect(value('1 234')).toBe('"1 234" has a thousands separator; write it without one');
    expect(value('1.234.567')).toBe('"1.234.567" has a thousands separator; write it without one');
    expect(value('0x10')).toBe('"0x10" is not a number');
    expect(value('Infinity')).toBe('"Infinity" is not a number');
    expect(value('1e999')).toBe('"1e999" is too large');
    expect(normaliseCell('\u22120,50')).toBe('-0.50');
    expect(normaliseCell('+3')).toBe('3');
    // One number pasted into a cell stays one cell.
    expect(pastedHeights('0,5')).toEqual(['0.5']);
    expect(pastedHeights('0,5\t0,75')).toEqual(['0.5', '0.75']);
    expect(readRows('a;"b;c"\n\n1;2').map((r) => [r.line, r.cells])).toEqual([[1, ['a', 'b;c']], [3, ['1', '2']]]);
    expect(cellProblem({ line: 7, cells: [] }, 0, '"x" is not a number')).toBe('Line 7, column 1: "x" is not a number');
  });
});
