import { useState } from 'react';
import { fromMm, UNIT_LABELS } from '../../../lib/units';
import { useSquarenessCalculation } from '../api/calc-squareness';
import { useStableBody } from '../hooks/use-stable-body';
import type { SquarenessRequest } from '../types';
import { fixed, lengthIn } from '../utils/format';
import { CalculationState } from './calculation-state';
import { CalculatorLayout } from './calculator-layout';
import { FieldGrid } from './field-grid';
import { NumberField, numberOrNull } from './number-field';
import { ResultTable } from './result-table';
import { ResultWarnings } from './result-warnings';
import { UnitFamilyPickers, useUnitFamilies } from './unit-families';

const FIELDS = ['sideX', 'sideY', 'diagonal1', 'diagonal2', 'gantrySpan'] as const;
type Field = (typeof FIELDS)[number];

export function SquarenessCalculator() {
  const families = useUnitFamilies({ lengthUnit: 'mm', readingUnit: 'mm' });
  const unit = families.units.lengthUnit;
  const [values, setValues] = useState<Record<Field, string>>({
    sideX: '',
    sideY: '',
    diagonal1: '',
    diagonal2: '',
    gantrySpan: '',
  });
  const set = (f: Field) => (text: string) => setValues((v) => ({ ...v, [f]: text }));
  const [sideX, sideY, diagonal1, diagonal2, gantrySpan] = FIELDS.map((f) => numberOrNull(values[f]));
  const ready = sideX !== null && sideY !== null && diagonal1 !== null && diagonal2 !== null;
  const body = useStableBody<SquarenessRequest>(
    ready
      ? {
          sideX: sideX!,
          sideY: sideY!,
          diagonal1: diagonal1!,
          diagonal2: diagonal2!,
          ...(gantrySpan !== null ? { gantrySpan } : {}),
          ...families.units,
        }
      : null,
  );
  const calc = useSquarenessCalculation(body);
  const r = calc.data?.result;
  const shown = calc.data?.request.lengthUnit ?? unit;
  const u = UNIT_LABELS[unit];

  return (
    <CalculatorLayout
      intro="Measure the two sides and both diagonals of a large rectangle the machine marked or cut (or of the frame). Diagonal 1 runs from the home corner to the far corner."
      inputs={
        <>
          <UnitFamilyPickers {...families} readings={false} />
          <FieldGrid>
            <NumberField label="Side along X" value={values.sideX} onChange={set('sideX')} unit={u} />
            <NumberField label="Side along Y" value={values.sideY} onChange={set('sideY')} unit={u} />
            <NumberField label="Diagonal 1" value={values.diagonal1} onChange={set('diagonal1')} unit={u} />
            <NumberField label="Diagonal 2" value={values.diagonal2} onChange={set('diagonal2')} unit={u} />
            <NumberField
              label="Gantry span"
              value={values.gantrySpan}
              onChange={set('gantrySpan')}
              unit={u}
              required={false}
              helperText="Distance between the two driven sides (or home switches); the X side when blank"
            />
          </FieldGrid>
        </>
      }
      results={
        <CalculationState
          waitingFor={ready ? null : 'Enter both sides and both diagonals.'}
          isFetching={calc.isFetching}
          error={calc.error}
        >
          {r && (
            <>
              <ResultTable
                title="Squareness result"
                rows={[
                  {
                    label: 'Out of square',
                    value: `${fixed(r.outOfSquareDeg, 4)}° (${fixed(r.outOfSquareArcsec, 0)}″)`,
                    strong: true,
                  },
                  { label: 'Per metre of travel', value: fixed(r.mmPerMetre, 3, 'mm/m') },
                  { label: 'Diagonal difference', value: lengthIn(r.diagonalDifference, shown) },
                  { label: 'Longer diagonal', value: r.outOfSquareDeg === 0 ? 'equal' : `Diagonal ${r.longDiagonal}` },
                  {
                    label: 'Move one side of the gantry by',
                    value: lengthIn(r.correction, shown),
                    note: `Over a span of ${fixed(fromMm(r.span, shown), shown === 'mm' || shown === 'um' ? 0 : 2, UNIT_LABELS[shown])}, in the direction that shortens diagonal ${r.longDiagonal}`,
                    strong: true,
                  },
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
