import { expect, test } from '@playwright/test';
import { cellProblem, normaliseCell, parseNumberCell, readRows } from '../frontend/src/lib/tabular-input';
import { parseSweepCsv } from '../frontend/src/features/rails/utils/parse-sweep-csv';
import { parseRunsCsv, splitRows } from '../frontend/src/features/drives/utils/parse-grid';
import { pastedHeights } from '../frontend/src/features/frame/utils/pasted-heights';
import { parseNumber, parseTable } from '../frontend/src/features/calculators/utils/read-table';

// Every way a table of numbers comes in (a rail sweep's CSV, a repeat-and-reverse file, a block
// pasted into the drives' grids, a block pasted into the bed grid, a calculator's table) reads the
// same text alike.
// Runs in Node: no page is opened.

const EXPECTED = [
  [0, 0],
  [200, 0.5],
  [400, -1.25],
  [600, 0.5],
];

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
  'paste into a calculator': (text) => {
    const parsed = parseTable(text, 2, 2, 'station and reading');
    expect(parsed.errors).toEqual([]);
    return parsed.rows;
  },
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
      [
        3,
        'Reading "1.234,5" has both a point and a comma; write it without a thousands separator, with one decimal mark',
      ],
      [4, 'Reading "abc" is not a number'],
    ]);
    expect(parseRunsCsv(text).problems).toEqual([
      'Line 3, column 2: "1.234,5" has both a point and a comma; write it without a thousands separator, with one decimal mark',
      'Line 4, column 2: "abc" is not a number',
    ]);
    expect(parseTable(text, 2, 2).errors).toEqual(parseRunsCsv(text).problems);
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
    expect(value('1,234.5')).toBe(
      '"1,234.5" has both a point and a comma; write it without a thousands separator, with one decimal mark',
    );
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
    expect(readRows('a;"b;c"\n\n1;2').map((r) => [r.line, r.cells])).toEqual([
      [1, ['a', 'b;c']],
      [3, ['1', '2']],
    ]);
    expect(cellProblem({ line: 7, cells: [] }, 0, '"x" is not a number')).toBe('Line 7, column 1: "x" is not a number');
  });

  test("a calculator's table: a header line, too few values, extra columns and empty cells", () => {
    const station = (text: string, max = 2) => parseTable(text, 2, max, 'station and reading');
    expect(station('Station;Reading (µm)\n0;0\n200;0,5')).toEqual({
      rows: [
        [0, 0],
        [200, 0.5],
      ],
      errors: [],
      headerSkipped: true,
    });
    // Only a line of words is a header: a first line with a typo in one cell is named, not skipped.
    expect(station('0;0x\n200;1')).toEqual({
      rows: [[200, 1]],
      errors: ['Line 1, column 2: "0x" is not a number'],
      headerSkipped: false,
    });
    expect(station('0\n200;1').errors).toEqual(['Line 1: needs 2 values (station and reading), found 1']);
    expect(station('0;0;first pass\n200;1;').rows).toEqual([
      [0, 0],
      [200, 1],
    ]);
    // A spreadsheet's trailing tab is no cell; an empty cell between numbers is refused, never closed up.
    expect(station('0\t1\t\n200\t2\t').rows).toEqual([
      [0, 1],
      [200, 2],
    ]);
    expect(station('0;;1\n200;2;3', 3).errors).toEqual(['Line 1, column 2: the cell is empty']);
    // Rows of any length from one value up (the positioning table: a target and its deviations).
    expect(parseTable('100\t0,01\t-0,02\n200\t0,03', 1).rows).toEqual([
      [100, 0.01, -0.02],
      [200, 0.03],
    ]);
    // Stricter than the calculators' own reader was: an en dash is not a minus, a thousands separator is no decimal mark.
    expect(station('0;\u20131').errors).toEqual(['Line 1, column 2: "\u20131" is not a number']);
    expect(station('0\t1 234').errors).toEqual([
      'Line 1, column 2: "1 234" has a thousands separator; write it without one',
    ]);
    // One number typed in a calculator's field.
    expect([parseNumber(''), parseNumber(' 0,012 '), parseNumber('\u22122.5'), parseNumber('1.5e-3')]).toEqual([
      null,
      0.012,
      -2.5,
      0.0015,
    ]);
    expect([parseNumber('abc'), parseNumber('1,234.5'), parseNumber('1 234')].every(Number.isNaN)).toBe(true);
  });
});
