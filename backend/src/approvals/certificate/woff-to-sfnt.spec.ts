import { createRequire } from 'node:module';
import { readFileSync } from 'node:fs';
import { woffToSfnt } from './woff-to-sfnt.js';

const require = createRequire(import.meta.url);

interface FontLike {
  postscriptName: string;
  numGlyphs: number;
  layout(text: string): { glyphs: { id: number }[]; advanceWidth: number };
}
// pdfkit's own font reader, loaded as plain JavaScript (it ships no type declarations).
const fontkit = require('fontkit') as { create(data: Buffer): FontLike };
const woff = readFileSync(require.resolve('@fontsource/roboto/files/roboto-latin-400-normal.woff'));

describe('woffToSfnt', () => {
  // fontkit (pdfkit's own font reader, an independent WOFF implementation) is the reference.
  it('gives a TrueType file with the same glyphs and metrics as the WOFF it came from', () => {
    const sfnt = woffToSfnt(woff);
    expect(sfnt.readUInt32BE(0)).toBe(0x00010000);
    const fromWoff = fontkit.create(woff);
    const fromSfnt = fontkit.create(sfnt);
    expect(fromSfnt.postscriptName).toBe(fromWoff.postscriptName);
    expect(fromSfnt.numGlyphs).toBe(fromWoff.numGlyphs);
    for (const text of ['Straightness ± 0.012 mm · 12.5 µm', 'Commissioning certificate']) {
      const a = fromWoff.layout(text);
      const b = fromSfnt.layout(text);
      expect(b.glyphs.map((g) => g.id)).toEqual(a.glyphs.map((g) => g.id));
      expect(b.advanceWidth).toBe(a.advanceWidth);
    }
  });

  it('passes a font that is not WOFF through unchanged', () => {
    const plain = Buffer.from('OTTO-not-a-woff');
    expect(woffToSfnt(plain)).toBe(plain);
  });
});
