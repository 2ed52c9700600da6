import { InputAdornment, TextField, type TextFieldProps } from '@mui/material';
import { parseNumberCell } from '../../../lib/tabular-input';

/** A decimal entry with its unit beside it; the value stays text until submitted. */
export function NumberField({ unit, ...props }: TextFieldProps & { unit?: string }) {
  return (
    <TextField
      {...props}
      slotProps={{
        ...props.slotProps,
        htmlInput: { inputMode: 'decimal', autoComplete: 'off', ...(props.slotProps?.htmlInput as object) },
        input: unit ? { endAdornment: <InputAdornment position="end">{unit}</InputAdornment> } : undefined,
      }}
    />
  );
}

/** A typed number, or null when empty or not a number ("1,5" is read as 1.5; "1.234,5" is refused). */
export function parseNumber(text: string): number | null {
  const parsed = parseNumberCell(text);
  return parsed.ok ? parsed.value : null;
}
