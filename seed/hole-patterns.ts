import { HolePatternsService } from '../backend/src/hole-patterns/hole-patterns.service.js';
import type { HolePatternDto } from '../backend/src/hole-patterns/dto/hole-pattern.dto.js';
import type { SeedContext } from './context.js';

/*
 * Invented drilling patterns for the plasma table (the rails' own templates come from the rails).
 * The motor bracket uses the usual NEMA 23 face: four holes on a 66.68 mm circle at 45° and a
 * 38.1 mm pilot boss (from memory: check the motor's drawing). The carriage plate is a grid.
 */
const MOTOR_BRACKET: HolePatternDto = {
  name: 'Y1 motor bracket',
  reference: 'bottom-left',
  lengthUnit: 'mm',
  width: 100,
  height: 90,
  entry: 'circle',
  circle: { centreX: 50, centreY: 45, circleDiameter: 66.68, count: 4, startAngleDeg: 45, diameter: 5.5 },
  notes: 'Bore the 38.1 mm pilot after the four holes; plate 8 mm steel.',
};

const CARRIAGE_PLATE: HolePatternDto = {
  name: 'X carriage plate',
  reference: 'left',
  lengthUnit: 'mm',
  width: 160,
  height: 120,
  entry: 'grid',
  grid: { originX: 35, originY: 30, rows: 2, columns: 2, pitchX: 90, pitchY: 60, diameter: 5.5 },
  notes: 'Clearance holes for the carriage’s M5 bolts.',
};

export async function seedHolePatterns(ctx: SeedContext): Promise<void> {
  const patterns = ctx.app.get(HolePatternsService);
  const builder = ctx.demo.people.builder;
  for (const dto of [MOTOR_BRACKET, CARRIAGE_PLATE]) await patterns.create(builder, ctx.machines!.plasma, dto);
}
