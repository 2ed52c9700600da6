import { MenuItem, TextField } from '@mui/material';
import { UNIT_LABELS, type LengthUnit } from '../../../lib/units';

const UNITS: LengthUnit[] = ['mm', 'um', 'in', 'thou'];

export function UnitSelect({
  label,
  value,
  onChange,
  units = UNITS,
}: {
  label: string;
  value: LengthUnit;
  onChange: (unit: LengthUnit) => void;
  units?: LengthUnit[];
}) {
  return (
    <TextField select label={label} value={value} onChange={(e) => onChange(e.target.value as LengthUnit)} sx={{ minWidth: 150, justifySelf: 'start' }}>
      {units.map((u) => (
        <MenuItem key={u} value={u}>
          {UNIT_LABELS[u]}
        </MenuItem>
      ))}
    </TextField>
  );
}
