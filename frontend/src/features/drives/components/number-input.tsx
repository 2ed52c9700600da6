import { InputAdornment, TextField, type TextFieldProps } from '@mui/material';

type Props = Omit<TextFieldProps, 'onChange' | 'value'> & {
  value: string;
  onChange: (v: string) => void;
  unit?: string;
};

/** A text field for a number, kept as typed (so "0." and "-" survive), with its unit beside it. */
export function NumberInput({ value, onChange, unit, slotProps, ...rest }: Props) {
  const invalid = value.trim() !== '' && !Number.isFinite(Number(value));
  return (
    <TextField
      {...rest}
      value={value}
      onChange={(e) => onChange(e.target.value.replace(',', '.'))}
      error={rest.error || invalid}
      helperText={invalid ? 'Enter a number' : rest.helperText}
      slotProps={{
        ...slotProps,
        htmlInput: { inputMode: 'decimal', ...(slotProps?.htmlInput as object) },
        input: unit
          ? { endAdornment: <InputAdornment position="end">{unit}</InputAdornment>, ...(slotProps?.input as object) }
          : slotProps?.input,
      }}
    />
  );
}

/** The number typed, or undefined when the field is blank or not a number. */
export const numberOf = (v: string): number | undefined =>
  v.trim() === '' || !Number.isFinite(Number(v)) ? undefined : Number(v);
