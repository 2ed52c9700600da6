import { TextField, type TextFieldProps } from '@mui/material';
import { Controller, type FieldValues, type Path, type UseFormReturn } from 'react-hook-form';

type Props<T extends FieldValues> = Omit<
  TextFieldProps,
  'name' | 'value' | 'onChange' | 'onBlur' | 'error' | 'form'
> & {
  /** The form (react-hook-form with its zod schema) the field belongs to. */
  form: UseFormReturn<T>;
  name: Path<T>;
};

/**
 * A text field bound to one field of a react-hook-form form. The schema's message for the field
 * shows under it in place of the hint once the form has been sent. After that, every change checks
 * the whole form again, because a schema's checks may run across fields (a first hole against the
 * rail's length, every length against the chosen unit).
 */
export function FormTextField<T extends FieldValues>({ form, name, helperText, ...rest }: Props<T>) {
  const { control, formState, trigger } = form;
  return (
    <Controller
      name={name}
      control={control}
      render={({ field, fieldState }) => (
        <TextField
          {...rest}
          name={field.name}
          value={field.value ?? ''}
          onChange={(e) => {
            field.onChange(e.target.value);
            if (formState.isSubmitted) void trigger();
          }}
          onBlur={field.onBlur}
          inputRef={field.ref}
          error={!!fieldState.error}
          helperText={fieldState.error?.message ?? helperText}
        />
      )}
    />
  );
}
