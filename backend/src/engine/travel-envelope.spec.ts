import { evaluateTravelEnvelope } from './travel-envelope.js';

describe('travel envelope', () => {
  // Worked by hand: a 1500 × 3000 mm sheet with 25 mm clearance each side needs 1550 × 3050 mm.
  it('compares each axis with the work size plus a margin at each end', () => {
    const r = evaluateTravelEnvelope({
      axes: [
        { axis: 'X', measuredTravelMm: 1562, workSizeMm: 1500 },
        { axis: 'Y', measuredTravelMm: 3040, workSizeMm: 3000 },
      ],
      marginPerSideMm: 25,
    });
    expect(r.axes[0]).toMatchObject({ requiredTravelMm: 1550, spareMm: 12, covers: true });
    expect(r.axes[1]).toMatchObject({ requiredTravelMm: 3050, spareMm: -10, covers: false });
    expect(r.coversAll).toBe(false);
  });

  it('defaults to no margin and counts an exact fit as covering', () => {
    const r = evaluateTravelEnvelope({ axes: [{ axis: 'Z', measuredTravelMm: 120, workSizeMm: 120 }] });
    expect(r.axes[0].covers).toBe(true);
    expect(r.coversAll).toBe(true);
  });

  it('names the problem on bad input', () => {
    expect(() => evaluateTravelEnvelope({ axes: [] })).toThrow('axes must list at least one axis');
    expect(() =>
      evaluateTravelEnvelope({
        axes: [
          { axis: 'X', measuredTravelMm: 1, workSizeMm: 1 },
          { axis: 'X', measuredTravelMm: 1, workSizeMm: 1 },
        ],
      }),
    ).toThrow('axis X is listed twice');
    expect(() => evaluateTravelEnvelope({ axes: [{ axis: 'X', measuredTravelMm: -1, workSizeMm: 1 }] })).toThrow(
      'axes[0].measuredTravel must not be negative',
    );
    expect(() =>
      evaluateTravelEnvelope({ axes: [{ axis: 'X', measuredTravelMm: 1, workSizeMm: 1 }], marginPerSideMm: -2 }),
    ).toThrow('marginPerSide must not be negative');
  });
});
