export type SafetyAnswer = 'yes' | 'no' | 'na';
export type SafetySection = 'stopping' | 'electrical' | 'cutting' | 'people';
export type WalkStatus = 'not-started' | 'within-target' | 'outside-target';

export interface WalkItem {
  id: string;
  text: string;
  builtIn: boolean;
  answer: { id: string; answer: SafetyAnswer; note: string; answeredBy: { id: string | null; name: string }; answeredAt: string } | null;
}

export interface SafetyWalk {
  id: string | null;
  machineId: string;
  startedAt: string | null;
  status: WalkStatus;
  counts: { total: number; answered: number; yes: number; no: number; na: number };
  blocking: boolean;
  locked: boolean;
  sections: { id: SafetySection; label: string; items: WalkItem[] }[];
}

export const ANSWER_LABELS: Record<SafetyAnswer, string> = { yes: 'Yes', no: 'No', na: 'Not applicable' };

export const safetyKeys = {
  all: ['safety'] as const,
  walk: (machineId: string) => [...safetyKeys.all, 'walk', machineId] as const,
  items: () => [...safetyKeys.all, 'items'] as const,
};
