import type { AnswerOf } from '../../lib/api/schemas';

export type SafetyWalk = AnswerOf<'/api/machines/{id}/safety-walk', 'get'>;
export type WalkItem = SafetyWalk['sections'][number]['items'][number];
export type SafetySection = SafetyWalk['sections'][number]['id'];
export type SafetyAnswer = NonNullable<WalkItem['answer']>['answer'];
export type WalkStatus = SafetyWalk['status'];

export const ANSWER_LABELS: Record<SafetyAnswer, string> = { yes: 'Yes', no: 'No', na: 'Not applicable' };

export const safetyKeys = {
  all: ['safety'] as const,
  walk: (machineId: string) => [...safetyKeys.all, 'walk', machineId] as const,
  items: () => [...safetyKeys.all, 'items'] as const,
};
