import { useState } from 'react';
import { Chip, MenuItem, TextField, Typography } from '@mui/material';
import { fromMm, UNIT_LABELS } from '../../../lib/units';
import { useScrewSpeedCalculation } from '../api/calc-screw-speed';
import { useStableBody } from '../hooks/use-stable-body';
import type { Mounting, ScrewSpeedRequest } from '../types';
import { fixed } from '../utils/format';
import { CalculationState } from './calculation-state';
import { CalculatorLayout } from './calculator-layout';
import { FieldGrid } from './field-grid';
import { NumberField, numberOrNull } from './number-field';
import { ResultTable } from './result-table';
import { ResultWarnings } from './result-warnings';
import { UnitFamilyPickers, useUnitFamilies } from './unit-families';

const MOUNTINGS: { value: Mounting; label: string }[] = [
  { value: 'fixed-free', label: 'Fixed – free' },
  { value: 'supported-supported', label: 'Supported – supported' },
  { value: 'fixed-supported', label: 'Fixed – supported' },
  { value: 'fixed-fixed', label: 'Fixed – fixed' },
];

type Field = 'nominalDiameter' | 'rootDiameter' | 'unsupportedLength' | 'lead' | 'feedRate' | 'dnLimit';

export function ScrewSpeedCalculator() {
  const [mounting, setMounting] = useState<Mounting>('fixed-supported');
  const [v, setV] = useState<Record<Field, string>>({
    nominalDiameter: '16',
    rootDiameter: '12.9',
    unsupportedLength: '',
    lead: '5',
    feedRate: '',
    dnLimit: '',
  });
  const families = useUnitFamilies({ lengthUnit: 'mm', readingUnit: 'mm' });
  const unit = families.units.lengthUnit;
  const u = UNIT_LABELS[unit];
  const set = (f: Field) => (text: string) => setV((s) => ({ ...s, [f]: text }));
  const n = (f: Field) => numberOrNull(v[f]);
  const required: Field[] = ['nominalDiameter', 'rootDiameter', 'unsupportedLength', 'lead', 'feedRate'];
  const ready = required.every((f) => n(f) !== null);
  const body = useStableBody<ScrewSpeedRequest>(
    ready
      ? {
          nominalDiameter: n('nominalDiameter')!,
          rootDiameter: n('rootDiameter')!,
          unsupportedLength: n('unsupportedLength')!,
          lead: n('lead')!,
          mounting,
          feedRate: n('feedRate')!,
          ...(n('dnLimit') !== null ? { dnLimit: n('dnLimit')! } : {}),
          ...families.units,
        }
      : null,
  );
  const calc = useScrewSpeedCalculation(body);
  const r = calc.data?.result;
  const shown = calc.data?.request.lengthUnit ?? unit;
  const feedDecimals = shown === 'in' ? 1 : 0;

  return (
    <CalculatorLayout
      intro="A ball screw's speed at a feed rate against its whirling (critical) speed and the nut's d·n limit. Root diameter and end mounting come from the screw maker's data."
      inputs={
        <>
          <TextField
            select
            label="End mounting"
            value={mounting}
            onChange={(e) => setMounting(e.target.value as Mounting)}
            sx={{ minWidth: 260, justifySelf: 'start' }}
          >
            {MOUNTINGS.map((m) => (
              <MenuItem key={m.value} value={m.value}>
                {m.label}
              </MenuItem>
            ))}
          </TextField>
          <UnitFamilyPickers {...families} readings={false} />
          <FieldGrid>
            <NumberField
              label="Nominal diameter"
              value={v.nominalDiameter}
              onChange={set('nominalDiameter')}
              unit={u}
            />
            <NumberField label="Root diameter" value={v.rootDiameter} onChange={set('rootDiameter')} unit={u} />
            <NumberField
              label="Unsupported length"
              value={v.unsupportedLength}
              onChange={set('unsupportedLength')}
              unit={u}
              helperText="Between the bearings, or bearing to nut at full travel"
            />
            <NumberField label="Lead" value={v.lead} onChange={set('lead')} unit={u} />
            <NumberField label="Feed rate" value={v.feedRate} onChange={set('feedRate')} unit={`${u}/min`} />
            <NumberField
              label="d·n limit"
              value={v.dnLimit}
              onChange={set('dnLimit')}
              unit="mm·rpm"
              required={false}
              helperText="Nominal diameter in mm × rpm; 70 000 for rolled screws when blank"
            />
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
              <Chip
                label={r.withinLimits ? 'Within the limits' : 'Too fast for this screw'}
                color={r.withinLimits ? 'success' : 'error'}
                sx={{ mb: 1 }}
              />
              <ResultTable
                title="Screw speed result"
                rows={[
                  { label: 'Screw speed at this feed', value: fixed(r.rpm, 0, 'rpm'), strong: true },
                  {
                    label: 'Permissible speed (whirling)',
                    value: fixed(r.permissibleSpeed, 0, 'rpm'),
                    note: 'Critical speed with the catalogue’s 0.8 safety factor',
                  },
                  { label: 'Critical speed', value: fixed(r.criticalSpeed, 0, 'rpm') },
                  {
                    label: 'd·n limit speed',
                    value: fixed(r.dnLimitSpeed, 0, 'rpm'),
                    note: `${fixed(r.dnLimit, 0)} ÷ nominal diameter`,
                  },
                  {
                    label: 'Highest feed rate',
                    value: fixed(fromMm(r.maxFeedRate, shown), feedDecimals, `${UNIT_LABELS[shown]}/min`),
                    note: r.limitedBy === 'dn-limit' ? 'Set by the d·n limit' : 'Set by the whirling speed',
                    strong: true,
                  },
                ]}
              />
              <ResultWarnings warnings={r.warnings} />
              <Typography variant="caption" color="text.secondary" component="p" sx={{ mt: 1 }}>
                Source: {r.source}. Check the screw and nut maker’s own limits before running at speed.
              </Typography>
            </>
          )}
        </CalculationState>
      }
    />
  );
}
