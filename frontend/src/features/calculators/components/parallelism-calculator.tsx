import { useMemo, useState } from 'react';
import { UNIT_LABELS } from '../../../lib/units';
import { useParallelismCalculation } from '../api/calc-parallelism';
import { useStableBody } from '../hooks/use-stable-body';
import type { ParallelismRequest } from '../types';
import { lengthIn } from '../utils/format';
import { parseTable } from '../utils/read-table';
import { CalculationState } from './calculation-state';
import { CalculatorLayout } from './calculator-layout';
import { PasteField } from './paste-field';
import { ResultTable } from './result-table';
import { ResultWarnings } from './result-warnings';
import { UnitFamilyPickers, useUnitFamilies } from './unit-families';

export function ParallelismCalculator() {
  const [text, setText] = useState('');
  const families = useUnitFamilies({ lengthUnit: 'mm', readingUnit: 'um' });
  const { lengthUnit, readingUnit } = families.units;
  const parsed = useMemo(() => parseTable(text, 3, 3, 'station and two readings'), [text]);
  const ready = parsed.rows.length >= 2 && parsed.errors.length === 0;
  const body = useStableBody<ParallelismRequest>(
    ready
      ? {
          positions: parsed.rows.map((r) => r[0]),
          railA: parsed.rows.map((r) => r[1]),
          railB: parsed.rows.map((r) => r[2]),
          lengthUnit,
          readingUnit,
        }
      : null,
  );
  const calc = useParallelismCalculation(body);
  const r = calc.data?.result;
  const req = calc.data?.request;
  const shown = req?.readingUnit ?? readingUnit;
  const spread = r ? r.differences.map((d, i) => ({ d, i })) : [];
  const widest = spread.length
    ? spread.reduce((a, b) => (Math.abs(b.d - r!.meanOffset) > Math.abs(a.d - r!.meanOffset) ? b : a))
    : null;

  return (
    <CalculatorLayout
      intro="Both rails read at the same stations against one datum (a straightedge, a level line or the master rail). Paste three columns: station, rail A, rail B."
      inputs={
        <>
          <UnitFamilyPickers {...families} lengthLabel="Station unit" />
          <PasteField
            label="Stations and readings of both rails"
            value={text}
            onChange={setText}
            columnsHint={`Station (${UNIT_LABELS[lengthUnit]}), rail A and rail B (${UNIT_LABELS[readingUnit]})`}
            placeholder={'0\t0\t12\n250\t4\t15\n500\t6\t13'}
            errors={parsed.errors}
            rowCount={parsed.rows.length}
            rowNoun="stations"
          />
        </>
      }
      results={
        <CalculationState
          waitingFor={
            ready
              ? null
              : parsed.errors.length
                ? 'Correct the lines marked in red.'
                : 'Enter at least two stations, each with a reading on both rails.'
          }
          isFetching={calc.isFetching}
          error={calc.error}
        >
          {r && req && (
            <>
              <ResultTable
                title="Parallelism result"
                rows={[
                  {
                    label: 'Parallelism',
                    value: lengthIn(r.parallelism, shown),
                    note: 'Spread of B − A over the stations',
                    strong: true,
                  },
                  {
                    label: 'Height difference (mean B − A)',
                    value: lengthIn(r.meanOffset, shown),
                    note: 'How far rail B sits above rail A on average',
                  },
                  ...(widest
                    ? [
                        {
                          label: 'Furthest from the mean',
                          value: `${lengthIn(r.differences[widest.i], shown)} at ${req.positions[widest.i]} ${UNIT_LABELS[req.lengthUnit]}`,
                        },
                      ]
                    : []),
                ]}
              />
              <ResultWarnings warnings={r.warnings} />
            </>
          )}
        </CalculationState>
      }
    />
  );
}
