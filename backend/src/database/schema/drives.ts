import {
  boolean,
  doublePrecision,
  index,
  integer,
  jsonb,
  pgTable,
  text,
  timestamp,
  uniqueIndex,
  uuid,
} from 'drizzle-orm/pg-core';
import { sql } from 'drizzle-orm';
import { id, oneOf, timestamps } from './columns.js';
import { workshops } from './workshops.js';
import { machines } from './machines.js';
import { users } from './users.js';
import { SCALE_MATERIALS, type ScaleMaterial } from '../../engine/thermal.js';

/** The units lengths and readings are typed in (1 in = 25.4 mm exactly). */
export const DRIVE_UNITS = ['mm', 'um', 'in', 'thou'] as const;

export const DRIVE_KINDS = ['screw', 'belt', 'rack'] as const;
export type DriveKind = (typeof DRIVE_KINDS)[number];

/**
 * The drive of an axis with the calculators' field names, all lengths in mm. Which fields are
 * set depends on the type: screw (lead, diameters, length between supports, mounting), belt
 * (pitch, pulley teeth) or rack and pinion (module, teeth).
 */
export interface DriveRecord {
  type: DriveKind;
  /** Screw lead (travel per turn): mm in `driveMm`, the axis's `lengthUnit` in `drive`. */
  lead?: number;
  /** Threads per inch, when the lead was given that way (lead = 25.4 / threadsPerInch mm, single start). */
  threadsPerInch?: number;
  /** Screw's nominal diameter: mm in `driveMm`, the axis's `lengthUnit` in `drive`. */
  nominalDiameter?: number;
  /** Screw's root diameter: mm in `driveMm`, the axis's `lengthUnit` in `drive`. */
  rootDiameter?: number;
  /** Screw length between supports: mm in `driveMm`, the axis's `lengthUnit` in `drive`. */
  unsupportedLength?: number;
  mounting?: 'fixed-free' | 'supported-supported' | 'fixed-supported' | 'fixed-fixed';
  /** Nominal diameter in mm × rpm the nut is rated for (mm·rpm); the rolled-screw 70 000 when absent. */
  dnLimit?: number;
  /** Belt tooth pitch: mm in `driveMm`, the axis's `lengthUnit` in `drive`. */
  beltPitch?: number;
  /** Teeth on the drive pulley (a count). */
  pulleyTeeth?: number;
  /** Pinion module, mm (defined in mm whatever the unit). */
  pinionModule?: number;
  /** Teeth on the pinion (a count). */
  pinionTeeth?: number;
}

/** One change of the steps per mm set in the controller. */
export interface StepsChange {
  /** Steps per mm before the change. */
  from: number;
  /** Steps per mm after the change. */
  to: number;
  at: string;
  by: string;
  reason: 'edited' | 'travel-trial';
  trialId?: string;
}

/** One axis of a machine; a dual-drive gantry has one per side (Y1, Y2). */
export const axes = pgTable(
  'axes',
  {
    id: id(),
    workshopId: uuid('workshop_id')
      .notNull()
      .references(() => workshops.id),
    machineId: uuid('machine_id')
      .notNull()
      .references(() => machines.id),
    name: text('name').notNull(),
    /** The unit the axis is set up in: travel, lead, feed rates (per minute) are shown in it; stored in mm. */
    lengthUnit: text('length_unit', { enum: DRIVE_UNITS }).notNull().default('mm'),
    drive: jsonb('drive').$type<DriveRecord>().notNull(),
    motorStepsPerRev: integer('motor_steps_per_rev').notNull(),
    microsteps: doublePrecision('microsteps').notNull(),
    gearRatio: doublePrecision('gear_ratio').notNull().default(1),
    stepsPerMm: doublePrecision('steps_per_mm').notNull(),
    maxFeedRateMmPerMin: doublePrecision('max_feed_rate_mm_per_min'),
    measuredTravelMm: doublePrecision('measured_travel_mm'),
    notes: text('notes').notNull().default(''),
    stepsHistory: jsonb('steps_history').$type<StepsChange[]>().notNull().default([]),
    ...timestamps,
  },
  (t) => [
    index('axes_machine_idx').on(t.workshopId, t.machineId),
    uniqueIndex('axes_machine_name_unique').on(t.machineId, sql`lower(${t.name})`),
    oneOf('axes_length_unit_check', t.lengthUnit, DRIVE_UNITS),
  ],
);

/** Commanded-versus-measured moves of one axis, as entered, with the engine's fit (mm). */
export const travelTrials = pgTable(
  'travel_trials',
  {
    id: id(),
    workshopId: uuid('workshop_id')
      .notNull()
      .references(() => workshops.id),
    machineId: uuid('machine_id')
      .notNull()
      .references(() => machines.id),
    axisId: uuid('axis_id')
      .notNull()
      .references(() => axes.id, { onDelete: 'cascade' }),
    /** Unit of the commanded and measured moves. */
    lengthUnit: text('length_unit', { enum: DRIVE_UNITS }).notNull().default('mm'),
    /** Errors and residuals are shown in it; the instrument's resolution is typed in it. */
    readingUnit: text('reading_unit', { enum: DRIVE_UNITS }).notNull().default('mm'),
    /** Machine and scale (tape, rule) temperatures, °C, and the scale's material, for referring results to 20 °C. */
    machineTemperatureC: doublePrecision('machine_temperature_c'),
    scaleTemperatureC: doublePrecision('scale_temperature_c'),
    scaleMaterial: text('scale_material').$type<ScaleMaterial>(),
    /** Smallest step the instrument reads, in readingUnit. */
    instrumentResolution: doublePrecision('instrument_resolution'),
    stepsPerMmUsed: doublePrecision('steps_per_mm_used').notNull(),
    /** Commanded and measured in lengthUnit, as typed. */
    moves: jsonb('moves')
      .$type<
        {
          /** Commanded move, in the record's `lengthUnit`. */
          commanded: number;
          /** Measured move, in the record's `lengthUnit`. */
          measured: number;
        }[]
      >()
      .notNull(),
    throughOrigin: boolean('through_origin').notNull().default(false),
    result: jsonb('result').$type<Record<string, unknown>>().notNull(),
    notes: text('notes').notNull().default(''),
    recordedById: uuid('recorded_by_id').references(() => users.id),
    recordedByName: text('recorded_by_name').notNull(),
    appliedAt: timestamp('applied_at', { withTimezone: true }),
    appliedByName: text('applied_by_name'),
    ...timestamps,
  },
  (t) => [
    index('travel_trials_axis_idx').on(t.workshopId, t.axisId, t.createdAt),
    oneOf('travel_trials_length_unit_check', t.lengthUnit, DRIVE_UNITS),
    oneOf('travel_trials_reading_unit_check', t.readingUnit, DRIVE_UNITS),
    oneOf('travel_trials_scale_material_check', t.scaleMaterial, SCALE_MATERIALS),
  ],
);

/** A repeat-and-reverse run (ISO 230-2 positioning test) of one axis. */
export const positioningRuns = pgTable(
  'positioning_runs',
  {
    id: id(),
    workshopId: uuid('workshop_id')
      .notNull()
      .references(() => workshops.id),
    machineId: uuid('machine_id')
      .notNull()
      .references(() => machines.id),
    axisId: uuid('axis_id')
      .notNull()
      .references(() => axes.id, { onDelete: 'cascade' }),
    /** Unit of the target positions. */
    lengthUnit: text('length_unit', { enum: DRIVE_UNITS }).notNull().default('mm'),
    /** Unit of the deviations. */
    readingUnit: text('reading_unit', { enum: DRIVE_UNITS }).notNull().default('mm'),
    /** Machine and scale (tape, rule) temperatures, °C, and the scale's material, for referring results to 20 °C. */
    machineTemperatureC: doublePrecision('machine_temperature_c'),
    scaleTemperatureC: doublePrecision('scale_temperature_c'),
    scaleMaterial: text('scale_material').$type<ScaleMaterial>(),
    /** Smallest step the instrument reads, in readingUnit. */
    instrumentResolution: doublePrecision('instrument_resolution'),
    /** Target positions in lengthUnit, as typed. */
    targets: jsonb('targets').$type<number[]>().notNull(),
    /** Deviations (actual − target) in readingUnit, as typed. */
    runs: jsonb('runs')
      .$type<
        {
          direction: 'up' | 'down';
          /** Deviation (actual − target) at each target, in the record's `readingUnit`. */
          deviations: number[];
        }[]
      >()
      .notNull(),
    result: jsonb('result').$type<Record<string, unknown>>().notNull(),
    notes: text('notes').notNull().default(''),
    recordedById: uuid('recorded_by_id').references(() => users.id),
    recordedByName: text('recorded_by_name').notNull(),
    ...timestamps,
  },
  (t) => [
    index('positioning_runs_axis_idx').on(t.workshopId, t.axisId, t.createdAt),
    oneOf('positioning_runs_length_unit_check', t.lengthUnit, DRIVE_UNITS),
    oneOf('positioning_runs_reading_unit_check', t.readingUnit, DRIVE_UNITS),
    oneOf('positioning_runs_scale_material_check', t.scaleMaterial, SCALE_MATERIALS),
  ],
);
