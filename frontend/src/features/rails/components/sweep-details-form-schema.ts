import { z } from 'zod';
import { typedOptionalNumber as optionalNum } from '../../../lib/form-number';
import type { SweepDetailsPatch } from '../api/update-sweep-details';
import type { Sweep } from '../types';

/**
 * A sweep's details as corrected after it was taken (its readings stay as taken). Each message
 * is shown under its field; the server's own checks (a torque not below zero) come after.
 */
export const sweepDetailsFormSchema = z
  .object({
    datum: z.string(),
    instrument: z.string(),
    takenBy: z.string(),
    temperature: z.string(),
    boltSize: z.string(),
    torque: z.string(),
    notes: z.string(),
  })
  // Every check in one refinement, so that every field's problem shows at once.
  .superRefine((v, ctx) => {
    const fail = (path: keyof typeof v, message: string) => ctx.addIssue({ code: 'custom', path: [path], message });
    if (Number.isNaN(optionalNum(v.temperature))) fail('temperature', 'Temperature must be a number of °C');
    if (Number.isNaN(optionalNum(v.torque))) fail('torque', 'Torque must be a number of N·m');
    if (!v.takenBy.trim()) fail('takenBy', 'Say who took the sweep');
  });

export type SweepDetailsFormValues = z.input<typeof sweepDetailsFormSchema>;

const text = (v: string | number | null | undefined) => (v === null || v === undefined ? '' : String(v));

export const sweepDetailsFormOf = (s: Sweep): SweepDetailsFormValues => ({
  datum: text(s.datum),
  instrument: s.instrument,
  takenBy: s.takenBy,
  temperature: text(s.temperatureC),
  boltSize: text(s.boltSize),
  torque: text(s.torqueNm),
  notes: s.notes,
});

/** Only what changed is sent: the history then names exactly what was corrected. */
export function toSweepDetailsPatch(v: SweepDetailsFormValues, s: Sweep): SweepDetailsPatch {
  const patch: SweepDetailsPatch = {};
  const temperatureC = optionalNum(v.temperature);
  const torqueNm = optionalNum(v.torque);
  if (v.instrument.trim() !== s.instrument) patch.instrument = v.instrument.trim();
  if (temperatureC !== s.temperatureC) patch.temperatureC = temperatureC;
  if (v.takenBy.trim() !== s.takenBy) patch.takenBy = v.takenBy.trim();
  if ((v.datum.trim() || null) !== s.datum) patch.datum = v.datum.trim() || null;
  if ((v.boltSize || null) !== s.boltSize) patch.boltSize = v.boltSize || null;
  if (torqueNm !== s.torqueNm) patch.torqueNm = torqueNm;
  if (v.notes !== s.notes) patch.notes = v.notes;
  return patch;
}
