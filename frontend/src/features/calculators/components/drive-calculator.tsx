import { useState } from 'react';
import { MenuItem, TextField } from '@mui/material';
import { UNIT_LABELS } from '../../../lib/units';
import { useDriveCalculation } from '../api/calc-drive';
import { useStableBody } from '../hooks/use-stable-body';
import type { DriveRequest, DriveType } from '../types';
import { lengthIn, significant } from '../utils/format';
import { CalculationState } from './calculation-state';
import { CalculatorLayout } from './calculator-layout';
import { FieldGrid } from './field-grid';
import { NumberField, numberOrNull } from './number-field';
import { ResultTable } from './result-table';
import { ResultWarnings } from './result-warnings';
import { UnitFamilyPickers, useUnitFamilies } from './unit-families';

const TYPES: { value: DriveType; label: string }[] = [
  { value: 'screw', label: 'Screw (ball or lead screw)' },
  { value: 'belt', label: 'Belt and pulley' },
  { value: 'rack', label: 'Rack and pinion' },
];

type Field =
  | 'motorStepsPerRev'
  | 'microsteps'
  | 'gearRatio'
  | 'lead'
  | 'threadsPerInch'
  | 'beltPitch'
  | 'pulleyTeeth'
  | 'pinionModule'
  | 'pinionTeeth';
type ScrewBy = 'lead' | 'threadsPerInch';

export function DriveCalculator() {
  const [type, setType] = useState<DriveType>('screw');
  const [screwBy, setScrewBy] = useState<ScrewBy>('lead');
  const families = useUnitFamilies({ lengthUnit: 'mm', readingUnit: 'mm' });
  const unit = families.units.lengthUnit;
  const [v, setV] = useState<Record<Field, string>>({
    motorStepsPerRev: '200',
    microsteps: '8',
    gearRatio: '1',
    lead: '',
    threadsPerInch: '',
    beltPitch: '',
    pulleyTeeth: '',
    pinionModule: '',
    pinionTeeth: '',
  });
  const set = (f: Field) => (text: string) => setV((s) => ({ ...s, [f]: text }));
  const n = (f: Field) => numberOrNull(v[f]);
  const needs: Record<DriveType, Field[]> = {
    screw: [screwBy],
    belt: ['beltPitch', 'pulleyTeeth'],
    rack: ['pinionModule', 'pinionTeeth'],
  };
  const needed: Field[] = ['motorStepsPerRev', 'microsteps', ...needs[type]];
  const ready = needed.every((f) => n(f) !== null);
  const body = useStableBody<DriveRequest>(
    ready
      ? {
          type,
          motorStepsPerRev: n('motorStepsPerRev')!,
          microsteps: n('microsteps')!,
          ...(n('gearRatio') !== null ? { gearRatio: n('gearRatio')! } : {}),
          ...Object.fromEntries(needs[type].map((f) => [f, n(f)])),
          ...families.units,
        }
      : null,
  );
  const calc = useDriveCalculation(body);
  const r = calc.data?.result;
  const shown = calc.data?.request.lengthUnit ?? unit;
  const u = UNIT_LABELS[unit];

  return (
    <CalculatorLayout
      intro="Steps per millimetre (and per inch) from the motor, the driver's microstepping and the drive. Lead is the travel per screw turn (pitch × starts), not the thread pitch alone."
      inputs={
        <>
          <TextField
            select
            label="Drive"
            value={type}
            onChange={(e) => setType(e.target.value as DriveType)}
            sx={{ minWidth: 260, justifySelf: 'start' }}
          >
            {TYPES.map((t) => (
              <MenuItem key={t.value} value={t.value}>
                {t.label}
              </MenuItem>
            ))}
          </TextField>
          <UnitFamilyPickers {...families} readings={false} />
          {type === 'screw' && (
            <TextField
              select
              label="Screw given by"
              value={screwBy}
              onChange={(e) => setScrewBy(e.target.value as ScrewBy)}
              sx={{ minWidth: 260, justifySelf: 'start' }}
            >
              <MenuItem value="lead">Lead (travel per turn)</MenuItem>
              <MenuItem value="threadsPerInch">Threads per inch (single start)</MenuItem>
            </TextField>
          )}
          <FieldGrid>
            <NumberField
              label="Motor steps per revolution"
              value={v.motorStepsPerRev}
              onChange={set('motorStepsPerRev')}
              unit="steps"
              helperText="200 for a 1.8° motor"
            />
            <NumberField label="Microsteps" value={v.microsteps} onChange={set('microsteps')} unit="×" />
            <NumberField
              label="Gear ratio"
              value={v.gearRatio}
              onChange={set('gearRatio')}
              unit=": 1"
              required={false}
              helperText="Motor turns per screw, pulley or pinion turn"
            />
            {type === 'screw' && screwBy === 'lead' && (
              <NumberField label="Lead" value={v.lead} onChange={set('lead')} unit={u} />
            )}
            {type === 'screw' && screwBy === 'threadsPerInch' && (
              <NumberField
                label="Threads per inch"
                value={v.threadsPerInch}
                onChange={set('threadsPerInch')}
                unit="TPI"
                helperText="Lead = 1 in ÷ TPI for a single-start screw"
              />
            )}
            {type === 'belt' && (
              <NumberField label="Belt pitch" value={v.beltPitch} onChange={set('beltPitch')} unit={u} />
            )}
            {type === 'belt' && (
              <NumberField label="Pulley teeth" value={v.pulleyTeeth} onChange={set('pulleyTeeth')} unit="teeth" />
            )}
            {type === 'rack' && (
              <NumberField
                label="Pinion module"
                value={v.pinionModule}
                onChange={set('pinionModule')}
                unit="mm"
                helperText="Always in mm: the module is defined in mm"
              />
            )}
            {type === 'rack' && (
              <NumberField label="Pinion teeth" value={v.pinionTeeth} onChange={set('pinionTeeth')} unit="teeth" />
            )}
          </FieldGrid>
        </>
      }
      results={
        <CalculationState
          waitingFor={ready ? null : 'Fill in every field marked *.'}
          isFetching={calc.isFetching}
          error={calc.error}
        >
          {r && (
            <>
              <ResultTable
                title="Steps per mm result"
                rows={[
                  {
                    label: 'Steps per mm',
                    value: significant(r.stepsPerMm, 7, 'steps/mm'),
                    strong: shown === 'mm' || shown === 'um',
                  },
                  {
                    label: 'Steps per inch',
                    value: significant(r.stepsPerIn, 7, 'steps/in'),
                    strong: shown === 'in' || shown === 'thou',
                    note: 'For a controller set up in inches',
                  },
                  {
                    label: 'Travel per revolution',
                    value: lengthIn(r.travelPerRev, shown),
                    note: 'Of the screw, pulley or pinion',
                  },
                  { label: 'Travel per motor revolution', value: lengthIn(r.travelPerMotorRev, shown) },
                  {
                    label: 'Resolution',
                    value: significant(r.resolution * 1000, 4, 'µm per step'),
                    note: 'Microsteps add resolution, not accuracy',
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
