import { z } from 'zod';
import { LENGTH_UNITS } from '../../../lib/units';
import type { NewAxis } from '../api/create-axis';
import type { DrivePreviewInput } from '../api/preview-drive';
import type { AxisPatch } from '../api/update-axis';
import { DRIVE_LABELS, MOUNTING_LABELS, type Axis, type Drive, type DriveType, type Mounting } from '../types';
import { numberOf } from './number-input';

const text = z.string();

/**
 * The axis form as typed: every number kept as the text typed (lengths in `lengthUnit`, the pinion
 * module in mm). The form checks only that the axis has a name (Save stays off until it has one);
 * the numbers are checked by the server, whose message names the field.
 */
export const axisFormSchema = z.object({
  name: text.refine((s) => s.trim() !== '', 'Give the axis a name'),
  lengthUnit: z.enum(LENGTH_UNITS),
  drive: z.object({
    type: z.enum(Object.keys(DRIVE_LABELS) as DriveType[]),
    /** A screw's lead given as a length or as threads per inch. */
    leadAs: z.enum(['length', 'tpi']),
    lead: text,
    threadsPerInch: text,
    nominalDiameter: text,
    rootDiameter: text,
    unsupportedLength: text,
    mounting: z.enum(Object.keys(MOUNTING_LABELS) as Mounting[]).or(z.literal('')),
    dnLimit: text,
    beltPitch: text,
    pulleyTeeth: text,
    pinionModule: text,
    pinionTeeth: text,
  }),
  motorStepsPerRev: text,
  microsteps: text,
  gearRatio: text,
  stepsPerMm: text,
  maxFeedRate: text,
  measuredTravel: text,
  notes: text,
});

export type AxisFormValues = z.input<typeof axisFormSchema>;
export type DriveDraft = AxisFormValues['drive'];

const str = (v: number | null | undefined) => (v === null || v === undefined ? '' : String(v));

/** The form for a new axis (no axis) or for editing one. */
export function axisFormOf(axis?: Axis): AxisFormValues {
  const d = axis?.drive;
  return {
    name: axis?.name ?? '',
    lengthUnit: axis?.lengthUnit ?? 'mm',
    drive: {
      type: d?.type ?? 'screw',
      leadAs: d?.threadsPerInch ? 'tpi' : 'length',
      lead: d?.threadsPerInch ? '' : str(d?.lead),
      threadsPerInch: str(d?.threadsPerInch),
      nominalDiameter: str(d?.nominalDiameter),
      rootDiameter: str(d?.rootDiameter),
      unsupportedLength: str(d?.unsupportedLength),
      mounting: d?.mounting ?? '',
      dnLimit: str(d?.dnLimit),
      beltPitch: str(d?.beltPitch),
      pulleyTeeth: str(d?.pulleyTeeth),
      pinionModule: str(d?.pinionModule),
      pinionTeeth: str(d?.pinionTeeth),
    },
    motorStepsPerRev: str(axis?.motorStepsPerRev ?? 200),
    microsteps: str(axis?.microsteps ?? 8),
    gearRatio: str(axis?.gearRatio ?? 1),
    stepsPerMm: str(axis?.stepsPerMm),
    maxFeedRate: str(axis?.maxFeedRate),
    measuredTravel: str(axis?.measuredTravel),
    notes: axis?.notes ?? '',
  };
}

/** Only the fields the drive type uses are sent. */
export function driveOf(d: DriveDraft): Drive {
  const pick = (keys: (keyof DriveDraft)[]) =>
    Object.fromEntries(keys.map((k) => [k, numberOf(d[k])]).filter(([, v]) => v !== undefined));
  if (d.type === 'belt') return { type: 'belt', ...pick(['beltPitch', 'pulleyTeeth']) };
  if (d.type === 'rack') return { type: 'rack', ...pick(['pinionModule', 'pinionTeeth']) };
  const lead = d.leadAs === 'tpi' ? pick(['threadsPerInch']) : pick(['lead']);
  return {
    type: 'screw',
    ...lead,
    ...pick(['nominalDiameter', 'rootDiameter', 'unsupportedLength', 'dnLimit']),
    ...(d.mounting ? { mounting: d.mounting } : {}),
  };
}

/**
 * What the drive calculator is asked for the theoretical steps per mm, or null while the drive
 * lacks the numbers that define it (a half-typed drive would only be refused).
 */
export function drivePreviewOf(v: AxisFormValues): DrivePreviewInput | null {
  const drive = driveOf(v.drive);
  const steps = numberOf(v.motorStepsPerRev);
  const micro = numberOf(v.microsteps);
  const { type, lead, threadsPerInch, beltPitch, pulleyTeeth, pinionModule, pinionTeeth } = drive;
  const defined =
    type === 'belt'
      ? beltPitch !== undefined && pulleyTeeth !== undefined
      : type === 'rack'
        ? pinionModule !== undefined && pinionTeeth !== undefined
        : lead !== undefined || threadsPerInch !== undefined;
  return steps && micro && defined
    ? {
        type,
        lengthUnit: v.lengthUnit,
        motorStepsPerRev: steps,
        microsteps: micro,
        gearRatio: numberOf(v.gearRatio),
        lead,
        threadsPerInch,
        beltPitch,
        pulleyTeeth,
        pinionModule,
        pinionTeeth,
      }
    : null;
}

function axisFieldsOf(v: AxisFormValues) {
  return {
    name: v.name.trim(),
    lengthUnit: v.lengthUnit,
    drive: driveOf(v.drive),
    motorStepsPerRev: numberOf(v.motorStepsPerRev) ?? NaN,
    microsteps: numberOf(v.microsteps) ?? NaN,
    gearRatio: numberOf(v.gearRatio) ?? 1,
    stepsPerMm: numberOf(v.stepsPerMm) ?? NaN,
    notes: v.notes,
  };
}

/** A new axis leaves an empty feed rate or travel out. */
export function toNewAxis(v: AxisFormValues): NewAxis {
  const maxFeedRate = numberOf(v.maxFeedRate);
  const measuredTravel = numberOf(v.measuredTravel);
  return {
    ...axisFieldsOf(v),
    ...(maxFeedRate === undefined ? {} : { maxFeedRate }),
    ...(measuredTravel === undefined ? {} : { measuredTravel }),
  };
}

/** An edit clears an emptied feed rate or travel with null. */
export function toAxisUpdate(v: AxisFormValues): AxisPatch {
  return {
    ...axisFieldsOf(v),
    maxFeedRate: numberOf(v.maxFeedRate) ?? null,
    measuredTravel: numberOf(v.measuredTravel) ?? null,
  };
}
