import type { ComponentProps } from 'react';
import { Controller, type FieldValues, type Path, type UseFormReturn } from 'react-hook-form';
import { NumberInput } from './number-input';

type Props<T extends FieldValues> = Omit<ComponentProps<typeof NumberInput>, 'value' | 'onChange' | 'name' | 'form'> & {
  /** The form (react-hook-form with its zod schema) the field belongs to. */
  form: UseFormReturn<T>;
  name: Path<T>;
};

/** A `NumberInput` (kept as typed, "Enter a number" while it is not one) bound to one field of a form. */
export function FormNumberInput<T extends FieldValues>({ form, name, ...rest }: Props<T>) {
  return (
    <Controller
      name={name}
      control={form.control}
      render={({ field }) => (
        <NumberInput
          {...rest}
          name={field.name}
          value={field.value ?? ''}
          onChange={field.onChange}
          onBlur={field.onBlur}
          inputRef={field.ref}
        />
      )}
    />
  );
}
