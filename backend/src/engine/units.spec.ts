import { EngineInputError } from './engine-input-error.js';
import { referenceJson } from './reference-data/reference-data.js';
import { arrayFromMm, arrayToMm, fromMm, MM_PER_UNIT, parseLengthUnit, toMm } from './units.js';

describe('units', () => {
  // International yard and pound agreement (1959): 1 in = 25.4 mm exactly; thou = 0.001 in.
  it('uses 1 in = 25.4 mm exactly', () => {
    expect(referenceJson('unit_facts.json').inch_to_mm).toMatchObject({ value: '25.4', exact: true });
    expect(toMm(1, 'in')).toBe(25.4);
    expect(toMm(1000, 'thou')).toBe(25.4);
    expect(toMm(1, 'thou')).toBe(0.0254);
    expect(MM_PER_UNIT.thou).toBe(0.0254);
    expect(toMm(1000, 'um')).toBe(1);
    expect(fromMm(25.4, 'in')).toBe(1);
    expect(fromMm(25.4, 'thou')).toBe(1000);
    expect(fromMm(0.001, 'um')).toBe(1);
  });

  it('converts typed decimals without binary drift', () => {
    expect(toMm(3, 'um')).toBe(0.003);
    expect(toMm(2, 'thou')).toBe(0.0508);
    expect(toMm(12, 'in')).toBe(304.8); // one foot = 0.3048 m exactly
  });

  it('round-trips every unit', () => {
    const values = [0, 0.0005, -1.25, 17, 1234.5678];
    for (const unit of ['mm', 'um', 'in', 'thou'] as const) {
      const back = arrayFromMm(arrayToMm(values, unit), unit);
      back.forEach((v, i) => expect(v).toBeCloseTo(values[i], 12));
    }
  });

  it('defaults to mm and refuses unknown units', () => {
    expect(parseLengthUnit(undefined)).toBe('mm');
    expect(parseLengthUnit('thou')).toBe('thou');
    expect(() => parseLengthUnit('µm')).toThrow(EngineInputError);
    expect(() => parseLengthUnit('cm')).toThrow('unit must be one of mm, um, in, thou (got "cm")');
  });
});
