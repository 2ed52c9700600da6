import { parse } from 'content-disposition';
import { contentDisposition, sanitizeFileName, withExtension } from './file-name.js';

describe('sanitizeFileName', () => {
  it.each([
    ['../../etc/passwd', 'passwd'],
    ['C:\\Users\\me\\rail Y1.jpg', 'rail Y1.jpg'],
    ['bell\u0007.png', 'bell.png'],
    ['tab\tand\nnewline.csv', 'tab and newline.csv'],
    // A right-to-left override can make "gpj.exe" read as "exe.jpg".
    ['photo\u202egpj.exe', 'photogpj.exe'],
    ['  .hidden.pdf  ', 'hidden.pdf'],
    ['...', 'file'],
    ['', 'file'],
    [undefined, 'file'],
  ])('%j → %j', (raw, expected) => {
    expect(sanitizeFileName(raw)).toBe(expected);
  });

  it('shortens long names to 120 characters and keeps the extension', () => {
    const name = sanitizeFileName('a'.repeat(500) + '.jpeg');
    expect(name).toHaveLength(120);
    expect(name.endsWith('.jpeg')).toBe(true);
  });

  it('counts characters, not UTF-16 units, so a long name is never cut inside a character', () => {
    const name = sanitizeFileName('📷'.repeat(200) + '.png');
    expect([...name]).toHaveLength(120);
    expect(name.endsWith('.png')).toBe(true);
    expect(name).not.toMatch(/[\ud800-\udbff](?![\udc00-\udfff])/);
  });
});

describe('withExtension', () => {
  it('adds the extension the contents call for, unless one of them is there', () => {
    expect(withExtension('scan', ['.pdf'])).toBe('scan.pdf');
    expect(withExtension('IMG_0042.JPEG', ['.jpg', '.jpeg'])).toBe('IMG_0042.JPEG');
    expect(withExtension('really.jpg', ['.png'])).toBe('really.jpg.png');
  });
});

describe('contentDisposition', () => {
  // Written and read back by the content-disposition package (RFC 6266 / 8187); the header stays
  // plain ASCII, with the exact name in filename* for names that are not.
  it.each(['plain.png', 'Rail Y1 — left.jpg', 'quote"back\\slash.pdf', 'Ölwanne (alt).csv', "it's 100%.png"])(
    '%j reads back exactly',
    (name) => {
      const header = contentDisposition('attachment', name);
      const parsed = parse(header);
      expect(parsed.type).toBe('attachment');
      expect(parsed.parameters.filename).toBe(name);
      expect(header).toMatch(/^[\x20-\x7e]+$/);
    },
  );
});
