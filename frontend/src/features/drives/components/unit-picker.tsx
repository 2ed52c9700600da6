import { MenuItem, TextField } from '@mui/material';
import { UNIT_LABELS, type LengthUnit } from '../../../lib/units';

const UNITS: LengthUnit[] = ['mm', 'um', 'in', 'thou'];

export function UnitPicker({ value, onChange, label = 'Unit' }: { value: LengthUnit; onChange: (u: LengthUnit) => void; label?: string }) {
  return (
    <TextField select label={label} value={value} onChange={(e) => onChange(e.target.value as LengthUnit)} sx={{ minWidth: 120 }}>
      {UNITS.map((u) => (
        <MenuItem key={u} value={u}>
          {UNIT_LABELS[u]}
        </MenuItem>
      ))}
    </TextField>
  );
}
