import { Checkbox, Field, Input, NativeSelect, Textarea, type InputProps } from '@chakra-ui/react';
import type { ReactNode, Ref } from 'react';
import {
  useController,
  type Control,
  type FieldPath,
  type FieldValues,
  type UseFormRegisterReturn,
} from 'react-hook-form';

/** A form's control, whatever its resolver turns the values into. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any -- the transformed type is irrelevant here
export type FormControl<V extends FieldValues> = Control<V, any, any>;

/** A Chakra checkbox bound to a boolean form value. */
export function FormCheckbox<V extends FieldValues>({
  control,
  name,
  children,
  size = 'md',
}: {
  control: FormControl<V>;
  name: FieldPath<V>;
  children: ReactNode;
  size?: 'sm' | 'md';
}) {
  const {
    field: { ref, name: fieldName, value, onChange, onBlur },
  } = useController({ control, name });
  return (
    <Checkbox.Root
      size={size}
      checked={Boolean(value)}
      onCheckedChange={(e) => onChange(e.checked === true)}
      alignItems="start"
    >
      <Checkbox.HiddenInput ref={ref} name={fieldName} onBlur={onBlur} />
      <Checkbox.Control mt="0.5" />
      <Checkbox.Label fontWeight="normal">{children}</Checkbox.Label>
    </Checkbox.Root>
  );
}

/** A labelled text or number field with its error and help. */
export function TextField({
  label,
  error,
  helper,
  required,
  registration,
  inputRef,
  ...input
}: {
  label: ReactNode;
  error?: string;
  helper?: ReactNode;
  required?: boolean;
  registration: UseFormRegisterReturn;
  inputRef?: Ref<HTMLInputElement>;
} & Omit<InputProps, 'name' | 'onChange' | 'onBlur'>) {
  return (
    <Field.Root invalid={!!error} required={required}>
      <Field.Label>
        {label}
        {required && <Field.RequiredIndicator />}
      </Field.Label>
      <Input {...input} {...registration} ref={inputRef ?? registration.ref} />
      {helper && !error && <Field.HelperText>{helper}</Field.HelperText>}
      <Field.ErrorText>{error}</Field.ErrorText>
    </Field.Root>
  );
}

/** The name of a catalogue item: required, and not the browser's to fill in. */
export function NameField({
  error,
  registration,
}: {
  error?: string;
  registration: UseFormRegisterReturn;
}) {
  return (
    <TextField label="Name" required error={error} registration={registration} autoComplete="off" />
  );
}

/** A labelled block of free text (a description, notes) with its error. */
export function TextAreaField({
  label,
  rows,
  error,
  registration,
}: {
  label: ReactNode;
  rows: number;
  error?: string;
  registration: UseFormRegisterReturn;
}) {
  return (
    <Field.Root invalid={!!error}>
      <Field.Label>{label}</Field.Label>
      <Textarea rows={rows} {...registration} />
      <Field.ErrorText>{error}</Field.ErrorText>
    </Field.Root>
  );
}

/** A decimal number: the phone shows the number pad; the text is read by `parseNumber`. */
export const decimalInput = { inputMode: 'decimal', autoComplete: 'off' } as const;

/** A native select (the phone's own picker) with its label and error. */
export function SelectField({
  label,
  error,
  helper,
  registration,
  options,
  placeholder,
}: {
  label: ReactNode;
  error?: string;
  helper?: ReactNode;
  registration: UseFormRegisterReturn;
  options: ReadonlyArray<{ value: string; label: string }>;
  placeholder?: string;
}) {
  return (
    <Field.Root invalid={!!error}>
      <Field.Label>{label}</Field.Label>
      <NativeSelect.Root>
        <NativeSelect.Field {...registration} bg="bg.subtle">
          {placeholder !== undefined && <option value="">{placeholder}</option>}
          {options.map((o) => (
            <option key={o.value} value={o.value}>
              {o.label}
            </option>
          ))}
        </NativeSelect.Field>
        <NativeSelect.Indicator />
      </NativeSelect.Root>
      {helper && !error && <Field.HelperText>{helper}</Field.HelperText>}
      <Field.ErrorText>{error}</Field.ErrorText>
    </Field.Root>
  );
}
