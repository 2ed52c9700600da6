import { BadRequestException } from '@nestjs/common';
import type { DriveRecord } from '../database/schema/drives.js';
import type { DriveInput } from '../engine/steps-per-mm.js';
import type { ScrewSpeedInput } from '../engine/screw-speed.js';
import type { DriveDto } from './dto/drive.dto.js';

/** The fields each drive type uses; the first group is needed for steps per mm. */
const FIELDS = {
  screw: { required: ['lead'], optional: ['nominalDiameter', 'rootDiameter', 'unsupportedLength', 'mounting', 'dnLimit'] },
  belt: { required: ['beltPitch', 'pulleyTeeth'], optional: [] },
  rack: { required: ['pinionModule', 'pinionTeeth'], optional: [] },
} as const;

const ALL_FIELDS = ['lead', 'nominalDiameter', 'rootDiameter', 'unsupportedLength', 'mounting', 'dnLimit', 'beltPitch', 'pulleyTeeth', 'pinionModule', 'pinionTeeth'] as const;

const TYPE_WORDS = { screw: 'a screw', belt: 'a belt', rack: 'a rack-and-pinion' } as const;

/** Checks which fields are present for the type and keeps only those (no stray values stored). */
export function toDriveRecord(dto: DriveDto): DriveRecord {
  const spec = FIELDS[dto.type];
  const problems: string[] = [];
  const allowed = new Set<string>([...spec.required, ...spec.optional]);
  for (const f of spec.required) if (dto[f] === undefined || dto[f] === null) problems.push(`drive.${f} is required for ${TYPE_WORDS[dto.type]} drive`);
  for (const f of ALL_FIELDS) if (!allowed.has(f) && dto[f] !== undefined && dto[f] !== null) problems.push(`drive.${f} does not apply to ${TYPE_WORDS[dto.type]} drive`);
  const positive = ['lead', 'nominalDiameter', 'rootDiameter', 'unsupportedLength', 'dnLimit', 'beltPitch', 'pinionModule'] as const;
  for (const f of positive) if (typeof dto[f] === 'number' && !(dto[f]! > 0)) problems.push(`drive.${f} must be greater than zero`);
  for (const f of ['pulleyTeeth', 'pinionTeeth'] as const) {
    if (typeof dto[f] === 'number' && !(Number.isInteger(dto[f]) && dto[f]! > 0)) problems.push(`drive.${f} must be a whole number greater than zero`);
  }
  if (dto.type === 'screw' && dto.rootDiameter && dto.nominalDiameter && dto.rootDiameter > dto.nominalDiameter) {
    problems.push('drive.rootDiameter must not be larger than drive.nominalDiameter');
  }
  if (problems.length) throw new BadRequestException(problems);
  const record: DriveRecord = { type: dto.type };
  for (const f of allowed) if (dto[f as keyof DriveDto] !== undefined && dto[f as keyof DriveDto] !== null) (record as unknown as Record<string, unknown>)[f] = dto[f as keyof DriveDto];
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
  for (const f of ['nominalDiameter', 'rootDiameter', 'unsupportedLength', 'mounting'] as const) if (drive[f] === undefined) missing.push(`drive.${f}`);
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

/** "Ball screw Ø16, lead 5 mm, fixed-supported over 1050 mm" and the like, for lists. */
export function describeDrive(drive: DriveRecord): string {
  switch (drive.type) {
    case 'screw': {
      const size = drive.nominalDiameter ? `Ø${drive.nominalDiameter} mm, ` : '';
      const mount = drive.mounting && drive.unsupportedLength ? `, ${drive.mounting} over ${drive.unsupportedLength} mm` : '';
      return `Screw ${size}lead ${drive.lead} mm${mount}`;
    }
    case 'belt':
      return `Belt ${drive.beltPitch} mm pitch, ${drive.pulleyTeeth}-tooth pulley`;
    case 'rack':
      return `Rack and pinion, module ${drive.pinionModule}, ${drive.pinionTeeth}-tooth pinion`;
  }
}

/** The G-code letter an axis name stands for ("Y1" → "Y"), or null for names like "Gantry". */
export function axisLetter(name: string): string | null {
  const m = /^\s*([XYZABCUVW])(?![A-Za-z])/i.exec(name);
  return m ? m[1].toUpperCase() : null;
}
