import { MenuItem, TextField } from '@mui/material';
import { UNIT_LABELS, type LengthUnit } from '../../../lib/units';

export function UnitSelect({ value, onChange, label = 'Unit', units = ['mm', 'in'] }: { value: LengthUnit; onChange: (u: LengthUnit) => void; label?: string; units?: LengthUnit[] }) {
  return (
    <TextField select label={label} value={value} onChange={(e) => onChange(e.target.value as LengthUnit)} sx={{ minWidth: 110 }}>
      {units.map((u) => (
        <MenuItem key={u} value={u}>
          {UNIT_LABELS[u]}
        </MenuItem>
      ))}
    </TextField>
  );
}
