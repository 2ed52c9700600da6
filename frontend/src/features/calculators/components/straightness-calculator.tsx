import { useMemo, useState } from 'react';
import { Box } from '@mui/material';
import { StraightnessChart } from '../../../components/charts/straightness-chart';
import { fromMm, toMm, UNIT_LABELS } from '../../../lib/units';
import { useStraightnessCalculation } from '../api/calc-straightness';
import { useStableBody } from '../hooks/use-stable-body';
import type { StraightnessRequest } from '../types';
import { lengthIn, slopePerMetre } from '../utils/format';
import { parseTable } from '../utils/read-table';
import { CalculationState } from './calculation-state';
import { CalculatorLayout } from './calculator-layout';
import { PasteField } from './paste-field';
import { ResultTable } from './result-table';
import { ResultWarnings } from './result-warnings';
import { UnitFamilyPickers, useUnitFamilies } from './unit-families';

export function StraightnessCalculator() {
  const [text, setText] = useState('');
  const families = useUnitFamilies({ lengthUnit: 'mm', readingUnit: 'um' });
  const { lengthUnit, readingUnit } = families.units;
  const parsed = useMemo(() => parseTable(text, 2, 2, 'station and reading'), [text]);
  const ready = parsed.rows.length >= 3 && parsed.errors.length === 0;
  const body = useStableBody<StraightnessRequest>(
    ready
      ? { positions: parsed.rows.map((r) => r[0]), readings: parsed.rows.map((r) => r[1]), lengthUnit, readingUnit }
      : null,
  );
  const calc = useStraightnessCalculation(body);
  const r = calc.data?.result;
  const req = calc.data?.request;
  // Results are shown in the units the answered request was given in.
  const shown = req?.readingUnit ?? readingUnit;

  return (
    <CalculatorLayout
      intro="Indicator readings at stations along one rail. Paste two columns from a spreadsheet or type one station per line; the result follows as you type."
      inputs={
        <>
          <UnitFamilyPickers {...families} lengthLabel="Station unit" />
          <PasteField
            label="Stations and readings"
            value={text}
            onChange={setText}
            columnsHint={`Station (${UNIT_LABELS[lengthUnit]}) and reading (${UNIT_LABELS[readingUnit]})`}
            placeholder={'0\t0\n100\t3\n200\t7\n300\t8'}
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
                : 'Enter at least three stations with a reading each.'
          }
          isFetching={calc.isFetching}
          error={calc.error}
        >
          {r && (
            <>
              <ResultTable
                title="Straightness result"
                rows={[
                  {
                    label: 'Straightness, minimum zone',
                    value: lengthIn(r.minimumZone.straightness, shown),
                    note: 'Narrowest band holding every reading (ISO 1101)',
                    strong: true,
                  },
                  {
                    label: 'Straightness, least squares',
                    value: lengthIn(r.leastSquares.straightness, shown),
                    note: 'Spread about the best-fit line',
                  },
                  {
                    label: 'Straightness, end points',
                    value: lengthIn(r.endPoint.straightness, shown),
                    note: 'Spread about the line through the first and last stations',
                  },
                  {
                    label: 'Slope of the least-squares line',
                    value: slopePerMetre(r.leastSquares.slope, shown),
                    note: 'Tilt of the rail against the indicator’s reference',
                  },
                  { label: 'Stations', value: String(r.leastSquares.residuals.length) },
                ]}
              />
              <ResultWarnings warnings={r.warnings} />
            </>
          )}
        </CalculationState>
      }
      chart={
        ready &&
        !calc.error &&
        r &&
        req && (
          <Box>
            <StraightnessChart
              points={req.positions.map((position, i) => ({
                position: toMm(position, req.lengthUnit),
                reading: req.readings[i],
              }))}
              leastSquares={{
                slope: fromMm(r.leastSquares.slope, shown),
                intercept: fromMm(r.leastSquares.intercept, shown),
              }}
              zone={{
                slope: fromMm(r.minimumZone.slope, shown),
                intercept: fromMm(r.minimumZone.intercept, shown),
                width: fromMm(r.minimumZone.straightness, shown),
              }}
              unitLabel={UNIT_LABELS[shown]}
            />
          </Box>
        )
      }
    />
  );
}
