import { BadRequestException } from '@nestjs/common';
import { axisLetter, describeDrive, driveInUnit, missingForSpeedCheck, toDriveRecord } from './drive-record.js';
import { defaultTargets } from './test-program.js';

describe('drive records', () => {
  it('reads the G-code letter from the axis name; a dual-drive gantry has Y1 and Y2 on Y', () => {
    expect(axisLetter('Y1')).toBe('Y');
    expect(axisLetter('y2 (right)')).toBe('Y');
    expect(axisLetter('X')).toBe('X');
    expect(axisLetter('Z axis')).toBe('Z');
    expect(axisLetter('Gantry')).toBeNull();
    expect(axisLetter('Xtra')).toBeNull();
  });

  it('keeps only the fields the drive type uses and names each missing or stray one', () => {
    expect(toDriveRecord({ type: 'belt', beltPitch: 2, pulleyTeeth: 20 })).toEqual({
      type: 'belt',
      beltPitch: 2,
      pulleyTeeth: 20,
    });
    const refuse = (dto: Parameters<typeof toDriveRecord>[0]) => {
      try {
        toDriveRecord(dto);
      } catch (e) {
        expect(e).toBeInstanceOf(BadRequestException);
        return (e as BadRequestException).getResponse() as { message: string[] };
      }
      throw new Error('accepted');
    };
    expect(refuse({ type: 'rack', pinionTeeth: 20.5, lead: 5 }).message).toEqual([
      'drive.pinionModule is required for a rack-and-pinion drive',
      'drive.lead does not apply to a rack-and-pinion drive',
      'drive.pinionTeeth must be a whole number greater than zero',
    ]);
  });

  it('says what the speed check still needs', () => {
    expect(missingForSpeedCheck({ type: 'screw', lead: 5, rootDiameter: 12.9 }, null)).toEqual([
      'drive.nominalDiameter',
      'drive.unsupportedLength',
      'drive.mounting',
      'maxFeedRate',
    ]);
    expect(
      describeDrive({
        type: 'screw',
        lead: 5,
        nominalDiameter: 16,
        unsupportedLength: 1050,
        mounting: 'fixed-supported',
      }),
    ).toBe('Screw Ø16 mm, lead 5 mm, fixed-supported over 1050 mm');
  });
});

describe('default targets of a repeat-and-reverse program', () => {
  // ISO 230-2 practice (from memory, see the reference formulas): at least five targets, about five per metre.
  it.each([
    [10, 140, 5],
    [10, 906, 6],
    [10, 3040, 17],
    [10, 20_000, 21],
  ])('from %d to %d mm: %d rising targets, ends included, spacing uneven', (from, to, count) => {
    const t = defaultTargets(from, to);
    expect(t).toHaveLength(count);
    expect(t[0]).toBe(from);
    expect(t[t.length - 1]).toBe(to);
    for (let i = 1; i < t.length; i++) expect(t[i]).toBeGreaterThan(t[i - 1]);
    const gaps = t.slice(1).map((v, i) => Math.round((v - t[i]) * 10));
    expect(new Set(gaps).size).toBeGreaterThan(1);
  });

  // unit_facts.json: 1 in = 25.4 mm exactly. An MXL belt's pitch is 0.08 in = 2.032 mm (from memory);
  // a 1/2-10 Acme screw, 10 threads per inch, has a 0.1 in = 2.54 mm lead (common practice).
  it('stores lengths typed in inches as mm and shows them back as typed; a lead may be threads per inch', () => {
    const belt = toDriveRecord({ type: 'belt', beltPitch: 0.08, pulleyTeeth: 20 }, 'in');
    expect(belt.beltPitch).toBeCloseTo(2.032, 12);
    expect(driveInUnit(belt, 'in').beltPitch).toBe(0.08);
    const acme = toDriveRecord({ type: 'screw', threadsPerInch: 10, nominalDiameter: 0.5 }, 'in');
    expect(acme).toEqual({ type: 'screw', lead: 2.54, threadsPerInch: 10, nominalDiameter: 12.7 });
    expect(driveInUnit(acme, 'in')).toMatchObject({ lead: 0.1, nominalDiameter: 0.5 });
    expect(describeDrive(acme, 'in')).toBe('Screw Ø0.5 in, 10 threads per inch (lead 0.1 in)');
    // The pinion module is millimetres by definition, whatever the axis's unit.
    expect(toDriveRecord({ type: 'rack', pinionModule: 1.5, pinionTeeth: 20 }, 'in').pinionModule).toBe(1.5);
    expect(() => toDriveRecord({ type: 'belt', beltPitch: 2, pulleyTeeth: 20, threadsPerInch: 5 })).toThrow(
      BadRequestException,
    );
    expect(() => toDriveRecord({ type: 'screw', threadsPerInch: -5 })).toThrow(BadRequestException);
  });
});
