import { useMemo, useState } from 'react';
import { PositioningChart } from '../../../components/charts/positioning-chart';
import { fromMm, UNIT_LABELS } from '../../../lib/units';
import { usePositioningCalculation } from '../api/calc-positioning';
import { useStableBody } from '../hooks/use-stable-body';
import type { PositioningRequest, UnitFamilies } from '../types';
import { lengthIn } from '../utils/format';
import { parseTable } from '../utils/read-table';
import { CalculationState } from './calculation-state';
import { CalculatorLayout } from './calculator-layout';
import { PasteField } from './paste-field';
import { PositioningTargetsTable } from './positioning-targets-table';
import { ResultTable } from './result-table';
import { ResultWarnings } from './result-warnings';
import { UnitFamilyPickers, useUnitFamilies } from './unit-families';

/** Rows: target, then n deviations approaching up, then n approaching down. */
function toRequest(rows: number[][], units: UnitFamilies): { body: PositioningRequest | null; problem: string | null } {
  if (rows.length === 0) return { body: null, problem: 'Enter one line per target.' };
  const width = rows[0].length;
  if (rows.some((r) => r.length !== width)) return { body: null, problem: 'Every line needs the same number of runs.' };
  if ((width - 1) % 2 !== 0 || width < 5) {
    return {
      body: null,
      problem: 'Each line needs the target and the same number of up and down runs, at least two of each.',
    };
  }
  const n = (width - 1) / 2;
  const runs: PositioningRequest['runs'] = [];
  for (let j = 0; j < n; j++) runs.push({ direction: 'up', deviations: rows.map((r) => r[1 + j]) });
  for (let j = 0; j < n; j++) runs.push({ direction: 'down', deviations: rows.map((r) => r[1 + n + j]) });
  return { body: { targets: rows.map((r) => r[0]), runs, ...units }, problem: null };
}

export function PositioningCalculator() {
  const [text, setText] = useState('');
  const families = useUnitFamilies({ lengthUnit: 'mm', readingUnit: 'um' });
  const { lengthUnit, readingUnit } = families.units;
  const parsed = useMemo(() => parseTable(text, 1, Infinity, 'target and deviations'), [text]);
  const { body: request, problem } = useMemo(
    () => toRequest(parsed.rows, { lengthUnit, readingUnit }),
    [parsed.rows, lengthUnit, readingUnit],
  );
  const waiting = parsed.errors.length ? 'Correct the lines marked in red.' : problem;
  const body = useStableBody<PositioningRequest>(waiting ? null : request);
  const calc = usePositioningCalculation(body);
  const r = calc.data?.result;
  const shown = calc.data?.request.readingUnit ?? readingUnit;
  const len = (mm: number) => lengthIn(mm, shown);

  return (
    <CalculatorLayout
      intro="A repeat-and-reverse run evaluated as ISO 230-2 defines it. One line per target: the target, then the deviations (actual − target) of each run approaching up, then of each run approaching down. Five runs each way is the standard cycle."
      inputs={
        <>
          <UnitFamilyPickers {...families} lengthLabel="Target unit" readingLabel="Deviation unit" />
          <PasteField
            label="Targets and deviations"
            value={text}
            onChange={setText}
            columnsHint={`Target (${UNIT_LABELS[lengthUnit]}), up runs, down runs (${UNIT_LABELS[readingUnit]})`}
            placeholder={'0\t2\t3\t1\t-2\t-1\t-3\n125\t5\t6\t4\t1\t2\t0'}
            errors={parsed.errors}
            rowCount={parsed.rows.length}
            rowNoun="targets"
          />
        </>
      }
      results={
        <CalculationState waitingFor={waiting} isFetching={calc.isFetching} error={calc.error}>
          {r && (
            <>
              <ResultTable
                title="Positioning result"
                rows={[
                  {
                    label: 'Accuracy A',
                    value: len(r.accuracy),
                    note: `Up ${len(r.accuracyUp)}, down ${len(r.accuracyDown)}`,
                    strong: true,
                  },
                  {
                    label: 'Repeatability R',
                    value: len(r.repeatability),
                    note: `Up ${len(r.repeatabilityUp)}, down ${len(r.repeatabilityDown)}`,
                    strong: true,
                  },
                  { label: 'Reversal value B', value: len(r.reversal), note: `Mean reversal ${len(r.reversalMean)}` },
                  {
                    label: 'Systematic deviation E',
                    value: len(r.systematic),
                    note: `Up ${len(r.systematicUp)}, down ${len(r.systematicDown)}`,
                  },
                  { label: 'Range of mean deviation M', value: len(r.meanRange) },
                  { label: 'Runs', value: `${r.runsUp} up, ${r.runsDown} down` },
                ]}
              />
              <ResultWarnings warnings={r.warnings} />
            </>
          )}
        </CalculationState>
      }
      chart={
        !waiting &&
        !calc.error &&
        r && (
          <>
            <PositioningChart
              targets={r.targets.map((t) => ({
                target: t.target,
                meanUp: fromMm(t.meanUp, shown),
                meanDown: fromMm(t.meanDown, shown),
                sUp: fromMm(t.sUp, shown),
                sDown: fromMm(t.sDown, shown),
              }))}
              unitLabel={UNIT_LABELS[shown]}
            />
            <PositioningTargetsTable targets={r.targets} unit={shown} />
          </>
        )
      }
    />
  );
}
