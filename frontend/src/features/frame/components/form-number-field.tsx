import { InputAdornment } from '@mui/material';
import type { FieldValues } from 'react-hook-form';
import { FormTextField } from '../../../components/form/form-text-field';

/**
 * A decimal entry bound to a react-hook-form form, with its unit beside it: the form's twin of
 * `NumberField` (the value stays text until sent; the schema's message shows in place of the hint).
 */
export function FormNumberField<T extends FieldValues>({
  unit,
  slotProps,
  ...props
}: Parameters<typeof FormTextField<T>>[0] & { unit?: string }) {
  return (
    <FormTextField
      {...props}
      slotProps={{
        ...slotProps,
        htmlInput: { inputMode: 'decimal', autoComplete: 'off', ...(slotProps?.htmlInput as object) },
        input: unit ? { endAdornment: <InputAdornment position="end">{unit}</InputAdornment> } : undefined,
      }}
    />
  );
}
