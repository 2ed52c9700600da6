import { useId, type ChangeEvent } from 'react';
import { FormControl, FormHelperText, InputLabel, OutlinedInput } from '@mui/material';

interface Props {
  label: string;
  value: string;
  onChange: (e: ChangeEvent<HTMLInputElement>) => void;
  type?: 'text' | 'email' | 'password';
  autoComplete?: string;
  required?: boolean;
  autoFocus?: boolean;
  error?: boolean;
  helperText?: string;
}

/**
 * A text field that looks like MUI's outlined TextField but is built from its parts, so the first
 * page a visitor opens does not load the select, menu and popover code TextField brings along.
 */
export function LightTextField({
  label,
  value,
  onChange,
  type = 'text',
  autoComplete,
  required,
  autoFocus,
  error,
  helperText,
}: Props) {
  const id = useId();
  return (
    <FormControl variant="outlined" fullWidth required={required} error={error}>
      <InputLabel htmlFor={id}>{label}</InputLabel>
      <OutlinedInput
        id={id}
        label={required ? `${label} *` : label}
        type={type}
        value={value}
        onChange={onChange}
        autoComplete={autoComplete}
        autoFocus={autoFocus}
        aria-describedby={helperText ? `${id}-help` : undefined}
      />
      {helperText && <FormHelperText id={`${id}-help`}>{helperText}</FormHelperText>}
    </FormControl>
  );
}
