import { BadRequestException } from '@nestjs/common';
import type { DriveRecord } from '../database/schema/drives.js';
import type { DriveInput } from '../engine/steps-per-mm.js';
import type { ScrewSpeedInput } from '../engine/screw-speed.js';
import type { DriveDto } from './dto/drive.dto.js';
import { fromMm, toMm, type LengthUnit } from '../engine/units.js';

/** The fields each drive type uses; the first group is needed for steps per mm. */
const FIELDS = {
  screw: {
    required: ['lead'],
    optional: ['nominalDiameter', 'rootDiameter', 'unsupportedLength', 'mounting', 'dnLimit'],
  },
  belt: { required: ['beltPitch', 'pulleyTeeth'], optional: [] },
  rack: { required: ['pinionModule', 'pinionTeeth'], optional: [] },
} as const;

/** Drive fields that are lengths: typed in the axis's lengthUnit, stored in mm (the pinion module is mm by definition). */
export const DRIVE_LENGTH_FIELDS = [
  'lead',
  'nominalDiameter',
  'rootDiameter',
  'unsupportedLength',
  'beltPitch',
] as const;

const ALL_FIELDS = [
  'lead',
  'nominalDiameter',
  'rootDiameter',
  'unsupportedLength',
  'mounting',
  'dnLimit',
  'beltPitch',
  'pulleyTeeth',
  'pinionModule',
  'pinionTeeth',
] as const;

const TYPE_WORDS = { screw: 'a screw', belt: 'a belt', rack: 'a rack-and-pinion' } as const;

/**
 * Checks which fields are present for the type and keeps only those (no stray values stored),
 * with lengths converted from the axis's unit to mm. A screw's lead may come as threads per inch.
 */
export function toDriveRecord(given: DriveDto, unit: LengthUnit = 'mm'): DriveRecord {
  const problems: string[] = [];
  const tpi = given.threadsPerInch;
  if (tpi !== undefined && tpi !== null) {
    if (given.type !== 'screw') problems.push(`drive.threadsPerInch does not apply to ${TYPE_WORDS[given.type]} drive`);
    else if (given.lead !== undefined && given.lead !== null)
      problems.push('drive.lead and drive.threadsPerInch give the same thing: send one of them');
    else if (!(tpi > 0)) problems.push('drive.threadsPerInch must be greater than zero');
  }
  if (problems.length) throw new BadRequestException(problems);
  // A lead from threads per inch is 1/tpi inch; 25.4 / tpi mm, converted back into the axis's unit.
  const dto: DriveDto = tpi ? { ...given, threadsPerInch: undefined, lead: fromMm(25.4 / tpi, unit) } : given;
  const spec = FIELDS[dto.type];
  const allowed = new Set<string>([...spec.required, ...spec.optional]);
  for (const f of spec.required)
    if (dto[f] === undefined || dto[f] === null)
      problems.push(`drive.${f} is required for ${TYPE_WORDS[dto.type]} drive`);
  for (const f of ALL_FIELDS)
    if (!allowed.has(f) && dto[f] !== undefined && dto[f] !== null)
      problems.push(`drive.${f} does not apply to ${TYPE_WORDS[dto.type]} drive`);
  const positive = [
    'lead',
    'nominalDiameter',
    'rootDiameter',
    'unsupportedLength',
    'dnLimit',
    'beltPitch',
    'pinionModule',
  ] as const;
  for (const f of positive)
    if (typeof dto[f] === 'number' && !(dto[f]! > 0)) problems.push(`drive.${f} must be greater than zero`);
  for (const f of ['pulleyTeeth', 'pinionTeeth'] as const) {
    if (typeof dto[f] === 'number' && !(Number.isInteger(dto[f]) && dto[f]! > 0))
      problems.push(`drive.${f} must be a whole number greater than zero`);
  }
  if (dto.type === 'screw' && dto.rootDiameter && dto.nominalDiameter && dto.rootDiameter > dto.nominalDiameter) {
    problems.push('drive.rootDiameter must not be larger than drive.nominalDiameter');
  }
  if (problems.length) throw new BadRequestException(problems);
  const record: DriveRecord = { type: dto.type };
  const lengths = new Set<string>(DRIVE_LENGTH_FIELDS);
  for (const f of allowed) {
    const v = dto[f as keyof DriveDto];
    if (v === undefined || v === null) continue;
    (record as unknown as Record<string, unknown>)[f] = lengths.has(f) ? toMm(v as number, unit) : v;
  }
  if (tpi) {
    record.lead = 25.4 / tpi;
    record.threadsPerInch = tpi;
  }
  return record;
}

export interface AxisDriveNumbers {
  motorStepsPerRev: number;
  microsteps: number;
  gearRatio: number;
}

export function toEngineDrive(drive: DriveRecord, axis: AxisDriveNumbers): DriveInput {
  return {
    type: drive.type,
    motorStepsPerRev: axis.motorStepsPerRev,
    microsteps: axis.microsteps,
    gearRatio: axis.gearRatio,
    leadMm: drive.lead,
    beltPitchMm: drive.beltPitch,
    pulleyTeeth: drive.pulleyTeeth,
    pinionModuleMm: drive.pinionModule,
    pinionTeeth: drive.pinionTeeth,
  };
}

/** What the speed check still needs, by field name; empty when it can run. */
export function missingForSpeedCheck(drive: DriveRecord, maxFeedRate: number | null): string[] {
  const missing: string[] = [];
  for (const f of ['nominalDiameter', 'rootDiameter', 'unsupportedLength', 'mounting'] as const)
    if (drive[f] === undefined) missing.push(`drive.${f}`);
  if (maxFeedRate === null) missing.push('maxFeedRate');
  return missing;
}

export function toEngineScrew(drive: DriveRecord, feedRateMmPerMin: number): ScrewSpeedInput {
  return {
    nominalDiameterMm: drive.nominalDiameter!,
    rootDiameterMm: drive.rootDiameter!,
    unsupportedLengthMm: drive.unsupportedLength!,
    leadMm: drive.lead!,
    mounting: drive.mounting!,
    feedRateMmPerMin,
    dnLimit: drive.dnLimit,
  };
}

/** A length in mm shown in a unit, without the float noise of the conversion (12 significant digits). */
export function tidy(valueMm: number, unit: LengthUnit): number {
  return Number(fromMm(valueMm, unit).toPrecision(12));
}

const UNIT_WORDS: Record<LengthUnit, string> = { mm: 'mm', um: 'µm', in: 'in', thou: 'thou' };

/** The drive record's lengths in the axis's unit (as they were typed, within 12 digits). */
export function driveInUnit(drive: DriveRecord, unit: LengthUnit): DriveRecord {
  const out = { ...drive } as Record<string, unknown>;
  for (const f of DRIVE_LENGTH_FIELDS) if (typeof drive[f] === 'number') out[f] = tidy(drive[f]!, unit);
  return out as unknown as DriveRecord;
}

/** "Screw Ø16 mm, lead 5 mm, fixed-supported over 1050 mm" and the like, for lists, in the axis's unit. */
export function describeDrive(drive: DriveRecord, unit: LengthUnit = 'mm'): string {
  const u = UNIT_WORDS[unit];
  const d = driveInUnit(drive, unit);
  switch (drive.type) {
    case 'screw': {
      const size = d.nominalDiameter ? `Ø${d.nominalDiameter} ${u}, ` : '';
      const mount = d.mounting && d.unsupportedLength ? `, ${d.mounting} over ${d.unsupportedLength} ${u}` : '';
      const lead = drive.threadsPerInch
        ? `${drive.threadsPerInch} threads per inch (lead ${d.lead} ${u})`
        : `lead ${d.lead} ${u}`;
      return `Screw ${size}${lead}${mount}`;
    }
    case 'belt':
      return `Belt ${d.beltPitch} ${u} pitch, ${drive.pulleyTeeth}-tooth pulley`;
    case 'rack':
      return `Rack and pinion, module ${drive.pinionModule}, ${drive.pinionTeeth}-tooth pinion`;
  }
}

/** The G-code letter an axis name stands for ("Y1" → "Y"), or null for names like "Gantry". */
export function axisLetter(name: string): string | null {
  const m = /^\s*([XYZABCUVW])(?![A-Za-z])/i.exec(name);
  return m ? m[1].toUpperCase() : null;
}
