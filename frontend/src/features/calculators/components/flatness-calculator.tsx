import { useMemo, useState } from 'react';
import { UNIT_LABELS } from '../../../lib/units';
import { useFlatnessCalculation } from '../api/calc-flatness';
import { useStableBody } from '../hooks/use-stable-body';
import type { FlatnessRequest } from '../types';
import { fixed, lengthIn } from '../utils/format';
import { parseTable } from '../utils/read-table';
import { CalculationState } from './calculation-state';
import { CalculatorLayout } from './calculator-layout';
import { PasteField } from './paste-field';
import { ResultTable } from './result-table';
import { ResultWarnings } from './result-warnings';
import { UnitFamilyPickers, useUnitFamilies } from './unit-families';

export function FlatnessCalculator() {
  const [text, setText] = useState('');
  const families = useUnitFamilies({ lengthUnit: 'mm', readingUnit: 'mm' });
  const { lengthUnit, readingUnit } = families.units;
  const parsed = useMemo(() => parseTable(text, 3, 3, 'x, y and height'), [text]);
  const ready = parsed.rows.length >= 3 && parsed.errors.length === 0;
  const body = useStableBody<FlatnessRequest>(
    ready ? { points: parsed.rows.map(([x, y, z]) => ({ x, y, z })), lengthUnit, readingUnit } : null,
  );
  const calc = useFlatnessCalculation(body);
  const r = calc.data?.result;
  const shown = calc.data?.request.readingUnit ?? readingUnit;

  return (
    <CalculatorLayout
      intro="Heights over the bed or slats, read with a gauge or indicator at points of a grid. Paste three columns: x, y and the height reading."
      inputs={
        <>
          <UnitFamilyPickers {...families} lengthLabel="Position unit" readingLabel="Height unit" />
          <PasteField
            label="Grid points"
            value={text}
            onChange={setText}
            columnsHint={`x and y (${UNIT_LABELS[lengthUnit]}) and height (${UNIT_LABELS[readingUnit]})`}
            placeholder={'0\t0\t0.00\n750\t0\t0.12\n1500\t0\t0.31\n0\t1500\t-0.05'}
            errors={parsed.errors}
            rowCount={parsed.rows.length}
            rowNoun="points"
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
                : 'Enter at least three points that are not all on one line.'
          }
          isFetching={calc.isFetching}
          error={calc.error}
        >
          {r && (
            <>
              <ResultTable
                title="Flatness result"
                rows={[
                  {
                    label: 'Flatness',
                    value: lengthIn(r.leastSquares.flatness, shown),
                    note: 'Spread of the heights about the best-fit plane',
                    strong: true,
                  },
                  { label: 'Tilt along X', value: fixed(r.tilt.xMmPerMetre, 3, 'mm/m') },
                  { label: 'Tilt along Y', value: fixed(r.tilt.yMmPerMetre, 3, 'mm/m') },
                  {
                    label: 'Steepest tilt',
                    value: fixed(r.tilt.mmPerMetre, 3, 'mm/m'),
                    note: `Rising towards ${fixed(r.tilt.directionDeg, 0, '°')} from +X`,
                  },
                  { label: 'Points', value: String(r.leastSquares.residuals.length) },
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
