import type { AnswerOf, Schemas } from '../../lib/api/schemas';

export type BoltDown = Schemas['BoltDownResponse'];
export type BoltDownMode = BoltDown['mode'];
/** `position` in mm from the rail's start, `at` in the bolt-down's lengthUnit; aims and readings in its readingUnit. */
export type BoltDownHole = Schemas['BoltDownHoleResponse'];
export type HoleWriteResult = Schemas['HoleWriteResponse'];

/** The parts of the rail the guide needs before a bolt-down exists. */
export type RailSummary = Pick<
  Schemas['RailResponse'],
  'id' | 'machineId' | 'label' | 'axis' | 'lengthMm' | 'profileSize' | 'holes' | 'typicalBoltSize'
>;

export type FinalSweepResult = AnswerOf<'/api/bolt-downs/{id}/final-sweep', 'post'>;

export const MODE_LABELS: Record<BoltDownMode, string> = { face: 'Face mode', line: 'Line mode' };

/** One sentence per mode, shown beside the guide. */
export const MODE_EXPLAINED: Record<BoltDownMode, string> = {
  face: "The indicator rides on a carriage against the frame's reference face, so every hole is brought to the reading of the first hole fixed.",
  line: 'Each hole is aimed at the straight line between the nearest fixed holes on either side, so the rail is laid straight between holes already tight.',
};

export const boltDownKeys = {
  all: ['bolt-downs'] as const,
  forRail: (railId: string) => [...boltDownKeys.all, 'rail', railId] as const,
  detail: (id: string) => [...boltDownKeys.all, 'detail', id] as const,
  rail: (railId: string) => [...boltDownKeys.all, 'rail-summary', railId] as const,
  boltTorques: () => [...boltDownKeys.all, 'bolt-torques'] as const,
};
