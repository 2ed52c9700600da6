import { InputAdornment, TextField } from '@mui/material';
import { parseNumber } from '../utils/read-table';

/** A number typed as text (so "0," mid-typing is not lost), with its unit beside it. */
export function NumberField({
  label,
  value,
  onChange,
  unit,
  required = true,
  helperText,
}: {
  label: string;
  value: string;
  onChange: (text: string) => void;
  unit?: string;
  required?: boolean;
  helperText?: string;
}) {
  const parsed = parseNumber(value);
  const invalid = parsed !== null && Number.isNaN(parsed);
  return (
    <TextField
      label={label}
      value={value}
      onChange={(e) => onChange(e.target.value)}
      required={required}
      error={invalid}
      helperText={invalid ? 'Enter a number' : helperText}
      slotProps={{
        htmlInput: { inputMode: 'decimal' },
        input: unit ? { endAdornment: <InputAdornment position="end">{unit}</InputAdornment> } : undefined,
      }}
      fullWidth
    />
  );
}

/** The field's number, or null when blank or unreadable. */
export function numberOrNull(text: string): number | null {
  const v = parseNumber(text);
  return v === null || Number.isNaN(v) ? null : v;
}
