import type { SafetySection } from '../database/schema/safety.js';
import type { CheckStatus } from '../records/readiness.js';
import { SECTION_LABELS, type SafetyItemDef } from './built-in-items.js';
import type { SafetyAnswerRow, SafetyItemRow, SafetyWalkRow } from './safety.repository.js';

export interface WalkItem extends SafetyItemDef {
  builtIn: boolean;
}

export interface WalkCounts {
  /** Count of items on the walk. */
  total: number;
  /** Count of items answered. */
  answered: number;
  /** Count of items answered yes. */
  yes: number;
  /** Count of items answered no. */
  no: number;
  /** Count of items answered not applicable. */
  na: number;
}

export type WalkStatus = Exclude<CheckStatus, 'waived'>;

/** Within target only when every item is answered and none is "no"; nothing answered is not started. */
export function walkStatus(c: WalkCounts): WalkStatus {
  if (c.answered === 0) return 'not-started';
  return c.answered === c.total && c.no === 0 ? 'within-target' : 'outside-target';
}

export function countAnswers(items: WalkItem[], answers: Map<string, SafetyAnswerRow>): WalkCounts {
  const c: WalkCounts = { total: items.length, answered: 0, yes: 0, no: 0, na: 0 };
  for (const item of items) {
    const a = answers.get(item.id);
    if (!a) continue;
    c.answered++;
    c[a.answer]++;
  }
  return c;
}

export function toSafetyItemResponse(row: SafetyItemRow) {
  return {
    id: row.id,
    section: row.section,
    text: row.text,
    builtIn: false,
    createdBy: row.createdByName,
    createdAt: row.createdAt.toISOString(),
  };
}

export function toWalkResponse(
  machineId: string,
  walk: SafetyWalkRow | null,
  items: WalkItem[],
  answers: Map<string, SafetyAnswerRow>,
  locked: boolean,
) {
  const counts = countAnswers(items, answers);
  const sections = (Object.keys(SECTION_LABELS) as SafetySection[]).map((section) => ({
    id: section,
    label: SECTION_LABELS[section],
    items: items
      .filter((i) => i.section === section)
      .map((i) => {
        const a = answers.get(i.id);
        return {
          id: i.id,
          text: i.text,
          builtIn: i.builtIn,
          answer: a
            ? {
                id: a.id,
                answer: a.answer,
                note: a.note,
                answeredBy: { id: a.answeredById, name: a.answeredByName },
                answeredAt: a.answeredAt.toISOString(),
              }
            : null,
        };
      }),
  }));
  return {
    id: walk?.id ?? null,
    machineId,
    startedAt: walk?.startedAt.toISOString() ?? null,
    status: walkStatus(counts),
    counts,
    /** A "no" anywhere keeps the machine from being approved. */
    blocking: counts.no > 0,
    locked,
    sections,
  };
}

export type SafetyWalkResponse = ReturnType<typeof toWalkResponse>;
