import { useMemo, useState } from 'react';
import { TravelErrorChart } from '../../../components/charts/travel-error-chart';
import { fromMm, UNIT_LABELS, type LengthUnit } from '../../../lib/units';
import { useTravelTrialCalculation } from '../api/calc-travel-trial';
import { useStableBody } from '../hooks/use-stable-body';
import type { TravelTrialRequest } from '../types';
import { fixed, lengthIn, significant } from '../utils/format';
import { parseTable } from '../utils/read-table';
import { CalculationState } from './calculation-state';
import { CalculatorLayout } from './calculator-layout';
import { FieldGrid } from './field-grid';
import { NumberField, numberOrNull } from './number-field';
import { PasteField } from './paste-field';
import { ResultTable } from './result-table';
import { ResultWarnings } from './result-warnings';
import { UnitFamilyPickers, useUnitFamilies } from './unit-families';

export function TravelTrialCalculator() {
  const [used, setUsed] = useState('');
  const [theory, setTheory] = useState('');
  const [text, setText] = useState('');
  const families = useUnitFamilies({ lengthUnit: 'mm', readingUnit: 'mm' });
  const unit = families.units.lengthUnit;
  const parsed = useMemo(() => parseTable(text, 2, 2, 'commanded and measured moves'), [text]);
  const stepsPerMmUsed = numberOrNull(used);
  const theoretical = numberOrNull(theory);
  const ready = stepsPerMmUsed !== null && parsed.rows.length >= 1 && parsed.errors.length === 0;
  const body = useStableBody<TravelTrialRequest>(
    ready
      ? {
          stepsPerMmUsed: stepsPerMmUsed!,
          ...(theoretical !== null ? { theoreticalStepsPerMm: theoretical } : {}),
          moves: parsed.rows.map(([commanded, measured]) => ({ commanded, measured })),
          ...families.units,
        }
      : null,
  );
  const calc = useTravelTrialCalculation(body);
  const r = calc.data?.result;
  const shown = calc.data?.request.lengthUnit ?? unit;
  // Chart errors in a unit that suits the size of the error, whatever unit the moves were read in.
  const chartUnit: LengthUnit = shown === 'in' || shown === 'thou' ? 'thou' : 'um';
  const u = UNIT_LABELS[unit];

  return (
    <CalculatorLayout
      intro="Command moves of the axis and measure how far it really went. The longer the moves, the better the correction; measured far from commanded usually means a wrong lead, pulley or ratio."
      inputs={
        <>
          <FieldGrid>
            <NumberField label="Steps per mm used" value={used} onChange={setUsed} unit="steps/mm" />
            <NumberField
              label="Steps per mm from the drive"
              value={theory}
              onChange={setTheory}
              unit="steps/mm"
              required={false}
              helperText="A correction more than 5 % from it is flagged"
            />
          </FieldGrid>
          <UnitFamilyPickers {...families} readings={false} lengthLabel="Move unit" />
          <PasteField
            label="Commanded and measured moves"
            value={text}
            onChange={setText}
            columnsHint={`Commanded and measured (${u})`}
            placeholder={'100\t99.82\n200\t199.65\n400\t399.31'}
            errors={parsed.errors}
            rowCount={parsed.rows.length}
            rowNoun="moves"
            minRows={5}
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
                : 'Enter the steps per mm in use and at least one move.'
          }
          isFetching={calc.isFetching}
          error={calc.error}
        >
          {r && (
            <>
              <ResultTable
                title="Travel trial result"
                rows={[
                  {
                    label: 'Corrected steps per mm',
                    value: significant(r.correctedStepsPerMm, 7, 'steps/mm'),
                    strong: true,
                  },
                  {
                    label: 'Corrected steps per inch',
                    value: significant(r.correctedStepsPerIn, 7, 'steps/in'),
                    note: 'For a controller set up in inches',
                  },
                  { label: 'Scale (measured ÷ commanded)', value: significant(r.scale, 7) },
                  { label: 'Scale error', value: fixed(r.errorPercent, 3, '%') },
                  {
                    label: 'Offset of the fit',
                    value: lengthIn(r.offset, shown),
                    note: 'Zero for a single move or repeats of one move',
                  },
                  {
                    label: 'Largest residual',
                    value: lengthIn(r.residualMax, shown),
                    note: 'Scatter of the moves about the fitted line',
                  },
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
        r && (
          <TravelErrorChart
            moves={r.moves.map((m) => ({ commanded: m.commanded, error: fromMm(m.error, chartUnit) }))}
            fit={{ slope: fromMm(r.scale - 1, chartUnit), offset: fromMm(r.offset, chartUnit) }}
            unitLabel={UNIT_LABELS[chartUnit]}
          />
        )
      }
    />
  );
}
