import { z } from 'zod';
import type { FinalSweepInput } from '../api/save-final-sweep';
import type { BoltDown } from '../types';
import type { GuideHole } from '../utils/guide-state';
import { parseReading } from '../utils/format';

/** The numbers besides the readings, each optional, read as a reading is (a comma works as the point). */
const OPTIONAL_NUMBERS = ['resolution', 'temperature', 'torque'] as const;

const optionalNumber = (text: string) => (text.trim() === '' ? undefined : parseReading(text));

/**
 * The final sweep as typed: a reading at every hole (in the bolt-down's reading unit) and the
 * sweep's details. `stations` names each hole's place ("150 mm") for its reading's message.
 * Every check in one refinement, so that every field's problem shows at once.
 */
export const finalSweepFormSchema = (stations: string[]) =>
  z
    .object({
      readings: z.array(z.string()),
      instrument: z.string(),
      resolution: z.string(),
      temperature: z.string(),
      phase: z.enum(['as-left', 'as-found']),
      takenBy: z.string(),
      datum: z.string(),
      boltSize: z.string(),
      torque: z.string(),
      notes: z.string(),
    })
    .superRefine((v, ctx) => {
      v.readings.forEach((reading, i) => {
        if (parseReading(reading) === null)
          ctx.addIssue({
            code: 'custom',
            path: ['readings', i],
            message: `The reading at ${stations[i]} is not a number`,
          });
      });
      for (const name of OPTIONAL_NUMBERS)
        if (optionalNumber(v[name]) === null)
          ctx.addIssue({ code: 'custom', path: [name], message: `The ${name} must be a number` });
    });

export type FinalSweepFormValues = z.input<ReturnType<typeof finalSweepFormSchema>>;

/** The form as offered: every hole's reading as it was fixed, the rail's usual bolt size picked. */
export const finalSweepFormOf = (holes: GuideHole[], typicalBoltSize: string | null): FinalSweepFormValues => ({
  readings: holes.map((h) => (h.reading === null ? '' : String(h.reading))),
  instrument: '',
  resolution: '',
  temperature: '',
  phase: 'as-left',
  takenBy: '',
  datum: '',
  boltSize: typicalBoltSize ?? '',
  torque: '',
  notes: '',
});

/** The request: only what was typed or accepted is sent (an empty field is left out). */
export function toFinalSweepInput(
  v: FinalSweepFormValues,
  bd: Pick<BoltDown, 'readingUnit'>,
  holes: GuideHole[],
): FinalSweepInput {
  return {
    readingUnit: bd.readingUnit,
    // Hole positions are sent as kept, in mm.
    lengthUnit: 'mm',
    phase: v.phase,
    stations: holes.map((h, i) => ({ position: h.position, reading: parseReading(v.readings[i])! })),
    instrument: v.instrument.trim() || undefined,
    resolution: optionalNumber(v.resolution) ?? undefined,
    temperatureC: optionalNumber(v.temperature) ?? undefined,
    takenBy: v.takenBy.trim() || undefined,
    datum: v.datum.trim() || undefined,
    boltSize: v.boltSize || undefined,
    torqueNm: optionalNumber(v.torque) ?? undefined,
    notes: v.notes.trim() || undefined,
  };
}
