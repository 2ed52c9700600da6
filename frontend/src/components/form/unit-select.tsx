import { MenuItem, TextField } from '@mui/material';
import { LENGTH_UNITS, UNIT_LABELS, type LengthUnit } from '../../lib/units';

const DEFAULT_LABEL = { length: 'Length unit', reading: 'Reading unit' } as const;

/**
 * Picks one of the two unit families: `length` for positions, moves, lengths, lead and travel;
 * `reading` for indicator readings, deviations and heights. Both offer mm, µm, in and thou.
 */
export function UnitFamilySelect({
  family,
  value,
  onChange,
  label = DEFAULT_LABEL[family],
  units = LENGTH_UNITS,
}: {
  family: 'length' | 'reading';
  value: LengthUnit;
  onChange: (unit: LengthUnit) => void;
  label?: string;
  units?: LengthUnit[];
}) {
  return (
    <TextField
      select
      label={label}
      value={value}
      onChange={(e) => onChange(e.target.value as LengthUnit)}
      sx={{ minWidth: 140, justifySelf: 'start' }}
      slotProps={{ htmlInput: { 'data-unit-family': family } }}
    >
      {units.map((u) => (
        <MenuItem key={u} value={u}>
          {UNIT_LABELS[u]}
        </MenuItem>
      ))}
    </TextField>
  );
}
