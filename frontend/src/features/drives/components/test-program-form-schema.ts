import { z } from 'zod';
import { LENGTH_UNITS } from '../../../lib/units';
import type { TestProgramParams } from '../api/download-test-program';
import type { Axis } from '../types';
import { numberOf } from './number-input';

const text = z.string();

/**
 * The test program's settings as typed, lengths in `lengthUnit`. Every number may be left blank
 * (the server's default); the server checks the rest and names the setting it refuses.
 */
export const testProgramFormSchema = z.object({
  kind: z.enum(['positioning', 'travel']),
  lengthUnit: z.enum(LENGTH_UNITS),
  feed: text,
  overrun: text,
  runs: text,
  dwell: text,
  start: text,
  letter: text,
  targets: text,
  distances: text,
  notes: text,
  format: z.enum(['nc', 'txt']),
});

export type TestProgramFormValues = z.input<typeof testProgramFormSchema>;

/** The settings first offered for an axis: five runs each way with a four-second dwell, in the axis's unit. */
export const testProgramFormOf = (axis: Axis): TestProgramFormValues => ({
  kind: 'positioning',
  lengthUnit: axis.lengthUnit ?? 'mm',
  feed: '',
  overrun: '',
  runs: '5',
  dwell: '4',
  start: '',
  letter: axis.letter ?? '',
  targets: '',
  distances: '',
  notes: '',
  format: 'nc',
});

/** Only the settings of the chosen kind of program are sent; a blank one is left to the server. */
export function toTestProgramParams(v: TestProgramFormValues): TestProgramParams {
  return {
    kind: v.kind,
    feed: numberOf(v.feed),
    overrun: numberOf(v.overrun),
    letter: v.letter.trim() || undefined,
    format: v.format,
    lengthUnit: v.lengthUnit,
    notes: v.notes.trim() || undefined,
    ...(v.kind === 'positioning'
      ? { runs: numberOf(v.runs), dwell: numberOf(v.dwell), targets: v.targets.replace(/\s+/g, '') || undefined }
      : { distances: v.distances.replace(/\s+/g, '') || undefined, start: numberOf(v.start) }),
  };
}
