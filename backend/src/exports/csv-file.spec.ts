import Papa from 'papaparse';
import { convert, csvFile, fileName, isoTime, tidy, words } from './csv-file.js';

describe('csvFile', () => {
  it('writes a header and rows with CRLF line ends, quoting what RFC 4180 says to quote', () => {
    const text = csvFile(
      ['Name', 'Reading (thou)'],
      [
        ['Rail "Y1", left', -0.5],
        ['X', 1.25],
      ],
    );
    // RFC 4180 §2: fields holding commas or quotes are quoted, a quote doubled; lines end in CRLF.
    expect(text).toBe('Name,Reading (thou)\r\n"Rail ""Y1"", left",-0.5\r\nX,1.25\r\n');
    // An independent reading of the file gets the same values back.
    expect(Papa.parse(text, { header: true, skipEmptyLines: true, dynamicTyping: true }).data).toEqual([
      { Name: 'Rail "Y1", left', 'Reading (thou)': -0.5 },
      { Name: 'X', 'Reading (thou)': 1.25 },
    ]);
  });

  it('a file without rows is its header line alone', () => {
    expect(csvFile(['Sweep', 'Reading (mm)'], [])).toBe('Sweep,Reading (mm)\r\n');
  });

  it('keeps text a spreadsheet would run as a formula from running, but leaves negative numbers alone', () => {
    // Common practice (OWASP "CSV injection"): text starting with = + - @ gets a leading apostrophe.
    const text = csvFile(
      ['Datum', 'Deviation (mm)'],
      [
        ['=HYPERLINK("x")', -0.02],
        ['@SUM(A1)', -1],
        ['-straightedge', 0],
      ],
    );
    const rows = text.trim().split('\r\n').slice(1);
    expect(rows[0]).toBe(`"'=HYPERLINK(""x"")",-0.02`);
    expect(rows[1]).toBe(`"'@SUM(A1)",-1`);
    expect(rows[2]).toBe(`"'-straightedge",0`);
  });
});

describe('units and times in a file', () => {
  it('converts exactly: 1 in = 25.4 mm and 1 thou = 0.001 in (international inch, 1959)', () => {
    expect(convert(1, 'in', 'mm')).toBe(25.4);
    expect(convert(1000, 'thou', 'in')).toBe(1);
    expect(convert(0.0254, 'mm', 'thou')).toBe(1);
    expect(convert(5, 'um', 'mm')).toBe(0.005);
    expect(convert(null, 'mm', 'in')).toBeNull();
    expect(convert(Number.NaN, 'mm', 'in')).toBeNull();
  });

  it('gives ten significant digits without float noise', () => {
    expect(tidy(0.004999999999970001)).toBe(0.005);
    expect(tidy(0.1 + 0.2)).toBe(0.3);
  });

  it('writes times in ISO 8601 with their zone, to the second', () => {
    expect(isoTime('2026-11-27T09:54:12.345Z')).toBe('2026-11-27T09:54:12Z');
    // A time given with an offset comes out as the same instant in UTC.
    expect(isoTime('2026-11-27T10:54:12+01:00')).toBe('2026-11-27T09:54:12Z');
  });

  it('names files and states plainly', () => {
    expect(fileName('rail', 'Y1 (left)', 'sweeps')).toBe('rail-y1-left-sweeps.csv');
    expect(words('within-target')).toBe('within target');
  });
});
