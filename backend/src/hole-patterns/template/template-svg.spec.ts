import { boltCircleHoles } from '../geometry/pattern-holes.js';
import { renderTemplateSvg } from './template-svg.js';
import type { TemplateInput } from './template-drawing.js';

const input: TemplateInput = {
  title: 'X carriage plate <A&B>',
  machineName: 'Test table',
  details: ['detail'],
  widthMm: 150,
  heightMm: 110,
  reference: 'top-right',
  unit: 'in',
  holes: [
    ...boltCircleHoles({
      centreXMm: 75,
      centreYMm: 55,
      circleDiameterMm: 80,
      count: 6,
      startAngleDeg: 0,
      diameterMm: 6.35,
    }),
    { xMm: 10, yMm: 100, diameterMm: 4 },
  ],
};

describe('template SVG', () => {
  const svg = renderTemplateSvg(input);
  const [, w, h, vw, vh] = /<svg[^>]*width="([\d.]+)mm" height="([\d.]+)mm" viewBox="0 0 ([\d.]+) ([\d.]+)"/.exec(svg)!;

  it('is drawn one user unit per millimetre (width and height in mm equal the view box)', () => {
    expect(Number(w)).toBe(Number(vw));
    expect(Number(h)).toBe(Number(vh));
  });

  it('puts every crosshair within 0.01 mm of its hole, measured from the outline’s lower-left corner', () => {
    const [, ox, oy, ow, oh] = /<rect class="outline" x="([\d.]+)" y="([\d.]+)" width="([\d.]+)" height="([\d.]+)"/
      .exec(svg)!
      .map(Number);
    expect([ow, oh]).toEqual([150, 110]);
    const centres = [
      ...svg.matchAll(/class="crosshair" d="M ([\d.-]+) ([\d.-]+) H ([\d.-]+) M ([\d.-]+) ([\d.-]+) V ([\d.-]+)"/g),
    ].map((m) => ({ xMm: Number(m[4]) - ox, yMm: oy + oh - Number(m[2]) }));
    expect(centres).toHaveLength(input.holes.length);
    input.holes.forEach((hole, i) =>
      expect(Math.hypot(hole.xMm - centres[i].xMm, hole.yMm - centres[i].yMm)).toBeLessThan(0.01),
    );
  });

  it('has a 100 mm bar and a 4 in (101.6 mm) bar', () => {
    const bars = [...svg.matchAll(/class="bar" x1="([\d.]+)" y1="[\d.]+" x2="([\d.]+)"/g)].map(
      (m) => Number(m[2]) - Number(m[1]),
    );
    expect(bars.map((b) => Number(b.toFixed(6)))).toEqual([100, 101.6]);
  });

  it('escapes text and labels diameters in the entered unit', () => {
    expect(svg).toContain('X carriage plate &lt;A&amp;B&gt;');
    expect(svg).toContain('Ø 0.25 in');
    expect(svg).toContain('REFERENCE: upper-right corner');
  });
});
