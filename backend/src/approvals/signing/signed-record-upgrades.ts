import { canonicalJson } from '../canonical-json.js';
import { decimalTimes } from './decimal-times.js';

/**
 * What the database's own migrations did to rows that were already signed: columns added with
 * their defaults, a single `unit` split into the two unit families and then dropped, travel-trial
 * measured moves converted to mm. None of it changes what a record means, but each changes the
 * row's canonical text, so a signature made before would no longer match the live row.
 *
 * A signed copy (itself checked against its signature first) is carried through the same steps
 * here, in the order the migrations ran. If the result equals the live record, the record is
 * unchanged since it was signed. Each step looks at the row's own shape (a column it adds is
 * absent; a column it reads is present), so a copy signed at any point picks up only the steps
 * that ran after it. A migration that changes the columns of a signed table adds its step here.
 */
type Row = Record<string, unknown>;
interface Step {
  /** The migration whose effect this is, for the reader. */
  migration: string;
  kind: string;
  apply(row: Row): void;
}

/** Adds columns the migration added, with the defaults it gave them, where the row lacks them. */
const added = (migration: string, kind: string, columns: Row): Step => ({
  migration,
  kind,
  apply: (row) => {
    for (const [k, v] of Object.entries(columns)) if (!(k in row)) row[k] = structuredClone(v);
  },
});

/** Copies the single `unit` into the unit families, as the migration's data step did. */
const fromUnit = (migration: string, kind: string, set: (unit: unknown, row: Row) => Row): Step => ({
  migration,
  kind,
  apply: (row) => {
    if ('unit' in row) Object.assign(row, set(row.unit, row));
  },
});

const dropped = (migration: string, kind: string, column: string): Step => ({
  migration,
  kind,
  apply: (row) => {
    delete row[column];
  },
});

const READ_UNITS = ['mm', 'um', 'in', 'thou'];
/** mm per unit, as decimal text (0024 multiplies in PostgreSQL's exact numeric). */
const MM_PER: Record<string, string> = { in: '25.4', thou: '0.0254', um: '0.001' };

const isMoveList = (moves: unknown): moves is Row[] =>
  Array.isArray(moves) &&
  moves.every((m) => !!m && typeof m === 'object' && !Array.isArray(m) && typeof (m as Row).measured === 'number');

const temperatures = {
  machineTemperatureC: null,
  scaleTemperatureC: null,
  scaleMaterial: null,
  instrumentResolution: null,
};

export const SIGNED_ROW_UPGRADES: readonly Step[] = [
  added('0018', 'rail-sweep', { readingUnit: 'mm', lengthUnit: 'mm', face: 'side', warnings: [] }),
  added('0018', 'rail', { lengthUnit: 'mm', spacingMm: null, endDistanceMm: null }),
  added('0018', 'bolt-down', { readingUnit: 'mm', lengthUnit: 'mm' }),
  fromUnit('0019', 'rail-sweep', (unit) => ({ readingUnit: unit, lengthUnit: 'mm', face: 'side' })),
  fromUnit('0019', 'bolt-down', (unit) => ({ readingUnit: unit, lengthUnit: 'mm' })),
  added('0020', 'axis', { lengthUnit: 'mm' }),
  added('0020', 'positioning-run', { lengthUnit: 'mm', readingUnit: 'mm', ...temperatures }),
  added('0020', 'travel-trial', { lengthUnit: 'mm', readingUnit: 'mm', ...temperatures }),
  dropped('0020', 'rail-sweep', 'unit'),
  dropped('0020', 'bolt-down', 'unit'),
  added('0021', 'bed-grid', { lengthUnit: 'mm', readingUnit: 'mm', resolutionMm: null }),
  added('0021', 'diagonal-check', { lengthUnit: 'mm', resolutionMm: null }),
  added('0021', 'test-cut', { lengthUnit: 'mm', plateThicknessMm: null, resolutionMm: null }),
  fromUnit('0022', 'diagonal-check', (unit) => ({ lengthUnit: unit })),
  fromUnit('0022', 'bed-grid', (unit) => ({ readingUnit: unit, lengthUnit: 'mm' })),
  fromUnit('0022', 'test-cut', (unit) => ({ lengthUnit: unit })),
  dropped('0023', 'bed-grid', 'unit'),
  dropped('0023', 'diagonal-check', 'unit'),
  dropped('0023', 'test-cut', 'unit'),
  fromUnit('0024', 'travel-trial', (unit, row) =>
    typeof unit === 'string' && unit in MM_PER && isMoveList(row.moves)
      ? {
          readingUnit: unit,
          moves: row.moves.map((m) => ({
            commanded: m.commanded,
            measured: decimalTimes(m.measured as number, MM_PER[unit], 12),
          })),
        }
      : {},
  ),
  fromUnit('0024', 'positioning-run', (unit) =>
    typeof unit === 'string' && READ_UNITS.includes(unit) ? { readingUnit: unit } : {},
  ),
  dropped('0025', 'positioning-run', 'unit'),
  dropped('0025', 'travel-trial', 'unit'),
  added('0027', 'machine', { lengthUnit: 'mm' }),
  added('0028', 'bolt-down', { abandonedAt: null, abandonedReason: null, abandonedByName: null }),
];

interface SignedEntry {
  kind: string;
  row: Row | null;
}

/**
 * The signed text as the migrations since would have left it, in canonical form; the same text
 * when no step applies. Only rows of records are touched: the manifestation, snapshot and target
 * values were stored in the approval itself and no migration has changed them.
 */
export function upgradeSignedContent(signedText: string): string {
  const content = JSON.parse(signedText) as { records?: Record<string, SignedEntry> };
  for (const entry of Object.values(content.records ?? {})) {
    if (!entry?.row) continue;
    for (const step of SIGNED_ROW_UPGRADES) if (step.kind === entry.kind) step.apply(entry.row);
  }
  return canonicalJson(content);
}
