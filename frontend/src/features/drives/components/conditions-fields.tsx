import { Box, MenuItem, TextField, Typography } from '@mui/material';
import { UNIT_LABELS, type LengthUnit } from '../../../lib/units';
import { SCALE_MATERIAL_LABELS, type ScaleMaterial } from '../types';
import { NumberInput, numberOf } from './number-input';

export interface ConditionsDraft {
  machineTemperature: string;
  scaleTemperature: string;
  scaleMaterial: ScaleMaterial;
  instrumentResolution: string;
}

export const blankConditions = (): ConditionsDraft => ({
  machineTemperature: '',
  scaleTemperature: '',
  scaleMaterial: 'steel',
  instrumentResolution: '',
});

/** The request fields of a draft: blanks are left out (no temperature, no reference to 20 °C). */
export function conditionsOf(d: ConditionsDraft) {
  const out: {
    machineTemperature?: number;
    scaleTemperature?: number;
    scaleMaterial?: ScaleMaterial;
    instrumentResolution?: number;
  } = {};
  const m = numberOf(d.machineTemperature);
  const s = numberOf(d.scaleTemperature);
  const r = numberOf(d.instrumentResolution);
  if (m !== undefined) out.machineTemperature = m;
  if (s !== undefined) out.scaleTemperature = s;
  if (m !== undefined || s !== undefined) out.scaleMaterial = d.scaleMaterial;
  if (r !== undefined) out.instrumentResolution = r;
  return out;
}

/**
 * Temperatures of the machine and the scale, the scale's material and the instrument's resolution.
 * `of` names what they belong to when two entry forms share a page ("runs": "Machine temperature
 * (runs)"), so every field keeps a label of its own.
 */
export function ConditionsFields({
  draft,
  onChange,
  readingUnit,
  of,
}: {
  draft: ConditionsDraft;
  onChange: (d: ConditionsDraft) => void;
  readingUnit: LengthUnit;
  of?: string;
}) {
  const set = (k: keyof ConditionsDraft) => (v: string) => onChange({ ...draft, [k]: v });
  const label = (words: string) => (of ? `${words} (${of})` : words);
  return (
    <Box>
      <Box sx={{ display: 'grid', gridTemplateColumns: { xs: '1fr', sm: '1fr 1fr' }, gap: 2 }}>
        <NumberInput
          label={label('Machine temperature')}
          unit="°C"
          value={draft.machineTemperature}
          onChange={set('machineTemperature')}
        />
        <NumberInput
          label={label('Scale temperature')}
          unit="°C"
          value={draft.scaleTemperature}
          onChange={set('scaleTemperature')}
        />
        <TextField
          select
          label={label('Scale material')}
          value={draft.scaleMaterial}
          onChange={(e) => onChange({ ...draft, scaleMaterial: e.target.value as ScaleMaterial })}
        >
          {(Object.keys(SCALE_MATERIAL_LABELS) as ScaleMaterial[]).map((m) => (
            <MenuItem key={m} value={m}>
              {SCALE_MATERIAL_LABELS[m]}
            </MenuItem>
          ))}
        </TextField>
        <NumberInput
          label={label('Instrument resolution')}
          unit={UNIT_LABELS[readingUnit]}
          value={draft.instrumentResolution}
          onChange={set('instrumentResolution')}
        />
      </Box>
      <Typography variant="body2" color="text.secondary" sx={{ mt: 0.5 }}>
        With both temperatures the result is referred to 20 °C (ΔL = α·L·ΔT, the machine taken as steel). Leave them
        blank to record without.
      </Typography>
    </Box>
  );
}
