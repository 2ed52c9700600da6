import { referenceJson } from './reference-data/reference-data.js';
import { evaluateDrive } from './steps-per-mm.js';

const checks = referenceJson('stepper_steps_per_mm.json').check_values_derived_here as {
  case: string;
  travel_per_rev_mm: number;
  steps_per_mm: number;
}[];
const check = (prefix: string) => checks.find((c) => c.case.startsWith(prefix))!;

describe('steps per mm', () => {
  // Open firmware documentation formula (steps = full steps × microsteps × gear ratio ÷ travel
  // per rev), check values derived from it: GT2 belt 2 mm × 20 teeth, 200 × 16 → 80 steps/mm.
  it('gives 80 steps/mm for a 2 mm × 20 tooth belt at 200 × 16', () => {
    const c = check('belt GT2');
    const r = evaluateDrive({ type: 'belt', motorStepsPerRev: 200, microsteps: 16, beltPitchMm: 2, pulleyTeeth: 20 });
    expect(r.travelPerRevMm).toBe(c.travel_per_rev_mm);
    expect(r.stepsPerMm).toBe(c.steps_per_mm);
    expect(r.resolutionMm).toBeCloseTo(1 / 80, 15);
  });

  it('gives 400, 640 and 320 steps/mm for 8 mm and 5 mm leads', () => {
    expect(evaluateDrive({ type: 'screw', motorStepsPerRev: 200, microsteps: 16, leadMm: 8 }).stepsPerMm).toBe(
      check('T8').steps_per_mm,
    );
    expect(evaluateDrive({ type: 'screw', motorStepsPerRev: 200, microsteps: 16, leadMm: 5 }).stepsPerMm).toBe(
      check('ball screw 16x5 (5 mm lead), 200 steps, 16').steps_per_mm,
    );
    // Common practice: 200-step motor, 8 microsteps, 5 mm lead → 320 steps/mm.
    expect(evaluateDrive({ type: 'screw', motorStepsPerRev: 200, microsteps: 8, leadMm: 5 }).stepsPerMm).toBe(320);
  });

  it('applies a 2:1 belt reduction to the screw (1280 steps/mm)', () => {
    const r = evaluateDrive({ type: 'screw', motorStepsPerRev: 200, microsteps: 16, gearRatio: 2, leadMm: 5 });
    expect(r.stepsPerMm).toBe(check('ball screw 16x5 via 2:1').steps_per_mm);
    expect(r.travelPerMotorRevMm).toBe(2.5);
  });

  // Rack and pinion: travel per turn π·m·z (pitch diameter d = m·z, the standard gear relation).
  it('uses π·m·z for a rack (m = 1.5, z = 20 → 94.248 mm/rev, 16.977 steps/mm at 200 × 8)', () => {
    const c = check('rack and pinion m=1.5');
    const r = evaluateDrive({
      type: 'rack',
      motorStepsPerRev: 200,
      microsteps: 8,
      pinionModuleMm: 1.5,
      pinionTeeth: 20,
    });
    expect(r.travelPerRevMm).toBeCloseTo(c.travel_per_rev_mm, 12);
    expect(r.stepsPerMm).toBeCloseTo(c.steps_per_mm, 12);
    // Rack calculator example: m = 2, z = 20 → 125.66 mm per turn.
    expect(
      evaluateDrive({ type: 'rack', motorStepsPerRev: 200, microsteps: 1, pinionModuleMm: 2, pinionTeeth: 20 })
        .travelPerRevMm,
    ).toBeCloseTo(125.66, 2);
  });

  it('names the missing or bad field', () => {
    expect(() => evaluateDrive({ type: 'screw', motorStepsPerRev: 200, microsteps: 16 })).toThrow(
      'lead is required for a screw drive',
    );
    expect(() => evaluateDrive({ type: 'belt', motorStepsPerRev: 200, microsteps: 16, beltPitchMm: 2 })).toThrow(
      'pulleyTeeth is required for a belt drive',
    );
    expect(() =>
      evaluateDrive({ type: 'belt', motorStepsPerRev: 200, microsteps: 16, beltPitchMm: 2, pulleyTeeth: 20.5 }),
    ).toThrow('pulleyTeeth must be a whole number');
    expect(() => evaluateDrive({ type: 'screw', motorStepsPerRev: 0, microsteps: 16, leadMm: 5 })).toThrow(
      'motorStepsPerRev must be greater than zero',
    );
    expect(() => evaluateDrive({ type: 'chain' as never, motorStepsPerRev: 200, microsteps: 16 })).toThrow(
      'type must be one of screw, belt, rack',
    );
  });
});
