import { referenceCsv, referenceJson } from './reference-data/reference-data.js';
import { expectRelative } from './relative.test-support.js';
import { evaluateScrewSpeed, MOUNTINGS, type Mounting, type ScrewSpeedInput } from './screw-speed.js';

const reference = referenceJson('ballscrew_critical_speed.json');
const base: ScrewSpeedInput = {
  nominalDiameterMm: 16,
  rootDiameterMm: 12.9,
  unsupportedLengthMm: 1000,
  leadMm: 5,
  mounting: 'fixed-supported',
  feedRateMmPerMin: 5000,
};

describe('screw speed', () => {
  // THK Ball Screw General Catalog eq. (7): λ2 = 3.4 / 9.7 / 15.1 / 21.9, 0.8 included.
  it('uses the THK catalogue factors', () => {
    const thk = reference.critical_speed_formulas.find((f: { source: string }) => f.source === 'THK').factors;
    for (const m of MOUNTINGS) expect(evaluateScrewSpeed({ ...base, mounting: m }).mountingFactor).toBe(thk[m].lambda2);
  });

  // MISUMI Economy Series catalogue worked example: Ø15, lead 5, root 12.5 mm, fixed-support,
  // 790 mm → allowable 3024 min⁻¹ (0.8 factor included).
  it('reproduces the MISUMI worked example (3024 rpm allowable)', () => {
    const r = evaluateScrewSpeed({ ...base, nominalDiameterMm: 15, rootDiameterMm: 12.5, unsupportedLengthMm: 790 });
    expect(Math.floor(r.permissibleSpeedRpm)).toBe(reference.published_worked_examples[0].published_result_rpm);
    expect(r.permissibleSpeedRpm).toBeCloseTo(3024.36, 2);
    expect(r.criticalSpeedRpm).toBeCloseTo(3024.36 / 0.8, 1);
  });

  // DENSO servo-mechanism design manual example: 3000 rpm over L = 850 mm with f = 15.1 needs a
  // root diameter of at least 14.4 mm, and dm·n ≤ 70 000 gives dm ≤ 23.3 mm.
  it('agrees with the DENSO sizing example (root ≥ 14.4 mm, diameter ≤ 23.3 mm at 3000 rpm)', () => {
    const at = (root: number, nominal: number) =>
      evaluateScrewSpeed({
        ...base,
        nominalDiameterMm: nominal,
        rootDiameterMm: root,
        unsupportedLengthMm: 850,
        leadMm: 10,
        feedRateMmPerMin: 30000,
      });
    expect(at(14.4, 20).permissibleSpeedRpm).toBeGreaterThanOrEqual(3000);
    expect(at(14.3, 20).permissibleSpeedRpm).toBeLessThan(3000);
    expect(at(14.4, 20).withinLimits).toBe(true);
    expect(at(14.4, 23.3).dnLimitSpeedRpm).toBeGreaterThanOrEqual(3000);
    expect(at(14.4, 23.4).dnLimitSpeedRpm).toBeLessThan(3000);
    expect(at(14.4, 23.4).withinLimits).toBe(false);
    expect(at(14.4, 23.4).limitedBy).toBe('dn-limit');
  });

  // Derived table for a 16×5 rolled screw (root 12.9 mm): THK and HIWIN formulas, 500–1500 mm.
  it('matches the derived 16×5 table for every mounting and length (THK rows)', () => {
    const rows = referenceCsv('ballscrew_16x5_derived_speeds.csv').filter((r) => r.source === 'THK');
    expect(rows).toHaveLength(20);
    for (const row of rows) {
      const r = evaluateScrewSpeed({
        ...base,
        mounting: row.mounting as Mounting,
        unsupportedLengthMm: Number(row.length_mm),
      });
      // The table lists the critical speed (no safety factor) and the permissible speed (0.8 once).
      expect(r.criticalSpeedRpm).toBeCloseTo(Number(row.critical_speed_no_safety_rpm), 2);
      expect(r.permissibleSpeedRpm).toBeCloseTo(Number(row['permissible_speed_with_0.8_rpm']), 2);
      // Applying 0.8 again to the catalogue's λ2 would land 20 % lower: never that.
      expect(r.permissibleSpeedRpm).not.toBeCloseTo(0.8 * Number(row['permissible_speed_with_0.8_rpm']), 0);
    }
  });

  // Independent catalogue: HIWIN BS-08-2-EN, nk = 2.71e8·fn·dk/ls², permissible 0.8·nk (HIWIN rows
  // of the derived 16×5 table). It agrees with THK within about 1 % except fixed-free, where
  // HIWIN's factor is about 6 % lower.
  it('agrees with the HIWIN catalogue rows within 1.5 % (fixed-free within 7 %)', () => {
    const rows = referenceCsv('ballscrew_16x5_derived_speeds.csv').filter((r) => r.source === 'HIWIN');
    expect(rows).toHaveLength(20);
    for (const row of rows) {
      const m = row.mounting as Mounting;
      const r = evaluateScrewSpeed({ ...base, mounting: m, unsupportedLengthMm: Number(row.length_mm) });
      const tolerance = m === 'fixed-free' ? 0.07 : 0.015;
      expectRelative(r.criticalSpeedRpm, Number(row.critical_speed_no_safety_rpm), tolerance);
      expectRelative(r.permissibleSpeedRpm, Number(row['permissible_speed_with_0.8_rpm']), tolerance);
    }
  });

  // THK example value and the d·n limit of a 16 mm rolled screw (HIWIN rolled: 70 000 / 16 = 4375 rpm).
  it('gives 1947.9 rpm fixed-supported at 1000 mm and a 4375 rpm d·n limit for a 16 mm screw', () => {
    const r = evaluateScrewSpeed(base);
    expect(r.permissibleSpeedRpm).toBeCloseTo(
      reference.derived_check_values['example_fixed_supported_L1000_dk12.9'].THK_permissible_rpm,
      6,
    );
    expect(r.dnLimitSpeedRpm).toBe(reference.derived_check_values.dn_limit_rpm_16mm_rolled_HIWIN_70000_over_ds16);
    expect(r.rpm).toBe(1000);
    expect(r.maxFeedRateMmPerMin).toBeCloseTo(5 * 1947.9, 6);
    expect(r.limitedBy).toBe('critical-speed');
    expect(r.withinLimits).toBe(true);
    expect(r.source).toMatch(/THK Ball Screw General Catalog.*equation \(7\)/);
  });

  // Common practice: a 16 mm rolled screw fixed–supported over 1500 mm is good for about 870 rpm,
  // about 4.3 m/min at 5 mm lead.
  it('limits a long 16×5 axis to about 4.3 m/min', () => {
    const r = evaluateScrewSpeed({ ...base, unsupportedLengthMm: 1500, feedRateMmPerMin: 6000 });
    expect(r.permissibleSpeedRpm).toBeGreaterThan(850);
    expect(r.permissibleSpeedRpm).toBeLessThan(880);
    expect(r.maxFeedRateMmPerMin / 1000).toBeCloseTo(4.3, 1);
    expect(r.withinLimits).toBe(false);
  });

  it('uses a given d·n limit, and the rpm exactly at a limit is within it', () => {
    const r = evaluateScrewSpeed({
      ...base,
      unsupportedLengthMm: 300,
      dnLimit: 90_000,
      feedRateMmPerMin: 5 * (90_000 / 16),
    });
    expect(r.dnLimitSpeedRpm).toBe(5625);
    expect(r.limitedBy).toBe('dn-limit');
    expect(r.withinLimits).toBe(true);
  });

  it('names the problem on bad input', () => {
    expect(() => evaluateScrewSpeed({ ...base, mounting: 'clamped' as never })).toThrow(
      'mounting must be one of fixed-free, supported-supported, fixed-supported, fixed-fixed',
    );
    expect(() => evaluateScrewSpeed({ ...base, rootDiameterMm: 17 })).toThrow(
      'rootDiameter must not be larger than nominalDiameter',
    );
    expect(() => evaluateScrewSpeed({ ...base, leadMm: 0 })).toThrow('lead must be greater than zero');
    expect(() => evaluateScrewSpeed({ ...base, feedRateMmPerMin: -1 })).toThrow('feedRate must not be negative');
    expect(() => evaluateScrewSpeed({ ...base, dnLimit: NaN })).toThrow('dnLimit must be a finite number');
  });
});

describe('speed headroom against the lower limit', () => {
  const base = { nominalDiameterMm: 16, rootDiameterMm: 12.9, leadMm: 5, mounting: 'fixed-supported' as const };
  // ballscrew_critical_speed.json: a 16 mm rolled screw's d·n limit is 70 000 / 16 = 4375 rpm (HIWIN),
  // while THK's permissible speed fixed-supported over 500 mm is 7791.6 rpm
  // (ballscrew_16x5_derived_speeds.csv): the d·n limit is the lower, so headroom is taken from it.
  it('takes headroom from the d·n limit when it is lower than the whirling limit', () => {
    const r = evaluateScrewSpeed({ ...base, unsupportedLengthMm: 500, feedRateMmPerMin: 5 * 4000 });
    expect(r.permissibleSpeedRpm).toBeCloseTo(7791.6, 6);
    expect(r.limitSpeedRpm).toBe(4375);
    expect(r.headroomPercent).toBeCloseTo((1 - 4000 / 4375) * 100, 12);
    // Against the whirling limit alone the same speed would show (1 − 4000/7791.6) ≈ 48.7 % headroom.
    expect(r.headroomPercent).toBeLessThan(9);
  });

  it('is negative above the d·n limit, never a large headroom beside a breach', () => {
    const r = evaluateScrewSpeed({ ...base, unsupportedLengthMm: 500, feedRateMmPerMin: 5 * 5000 });
    expect(r.withinLimits).toBe(false);
    expect(r.headroomPercent).toBeCloseTo((1 - 5000 / 4375) * 100, 12);
  });

  // THK permissible 1947.9 rpm at 1000 mm (derived_check_values) is below 4375: headroom from it.
  it('takes headroom from the permissible speed when whirling is the lower limit', () => {
    const r = evaluateScrewSpeed({ ...base, unsupportedLengthMm: 1000, feedRateMmPerMin: 5000 });
    expect(r.limitSpeedRpm).toBeCloseTo(1947.9, 6);
    expect(r.headroomPercent).toBeCloseTo((1 - 1000 / 1947.9) * 100, 6);
  });
});
