import type { AnswerOf, Schemas } from '../../lib/api/schemas';

export type Rail = Schemas['RailResponse'];
export type RailListItem = Schemas['RailListItem'];
export type Sweep = Schemas['SweepResponse'];
export type SweepSummary = Schemas['SweepSummary'];
export type SweepPhase = Sweep['phase'];
export type SweepFace = Sweep['face'];
export type SweepStatus = Sweep['status'];
export type TargetValue = Sweep['target'];
export type StraightnessReference = NonNullable<TargetValue['reference']>;
export type ResultWarning = Schemas['ResultWarning'];
export type FitLine = Schemas['StoredLine'];
export type LocalSlope = Schemas['StoredLocalSlope'];
export type StraightnessResult = Schemas['StoredSweepResult'];
/** A sweep as the rail's list gives it: the summary, no readings (useSweep has them). */
export type SweepListItem = Schemas['SweepListItem'];

export const FACE_LABELS: Record<SweepFace, string> = {
  side: 'Side face (sideways straightness)',
  top: 'Top face (heights)',
};
export type CheckState = SweepStatus | 'not-comparable' | 'not-started';

/**
 * A sweep as recorded: the described request with the id the browser makes (also the entry's
 * Idempotency-Key) and both unit families named.
 */
export type NewSweep = Omit<Schemas['CreateSweepDto'], 'id'> &
  Required<Pick<Schemas['CreateSweepDto'], 'readingUnit' | 'lengthUnit' | 'face'>> & {
    id: string;
  };

/** One station of a sweep: its position in `lengthUnit`, its reading in `readingUnit`. */
export type Station = Schemas['StationDto'];

/** A rail's pair: no partner, not comparable yet, judged on parallelism, or on height alone; lengths in mm. */
export type Parallelism = AnswerOf<'/api/rails/{id}/parallelism', 'get'>;

export type BoltTorques = AnswerOf<'/api/rails/bolt-torques', 'get'>;

export const PHASE_LABELS: Record<SweepPhase, string> = { 'as-found': 'As found', 'as-left': 'As left' };

/** One key factory for rails; machine-scoped lists sit under the machine's id. */
export const railKeys = {
  all: ['rails'] as const,
  list: (machineId: string) => [...railKeys.all, 'machine', machineId] as const,
  detail: (id: string) => [...railKeys.all, 'detail', id] as const,
  sweeps: (id: string) => [...railKeys.all, 'sweeps', id] as const,
  parallelism: (id: string) => [...railKeys.all, 'parallelism', id] as const,
  boltTorques: () => [...railKeys.all, 'bolt-torques'] as const,
  preview: (body: unknown) => [...railKeys.all, 'preview', body] as const,
};
