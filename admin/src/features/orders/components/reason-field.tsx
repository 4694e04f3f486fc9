import { Field, Textarea } from '@chakra-ui/react';
import type { ReactNode } from 'react';

/** A reason for the order's history, with its limit and its error. */
export function ReasonField({
  label,
  helper,
  value,
  onChange,
  error,
  required,
  max,
}: {
  label: string;
  helper?: ReactNode;
  value: string;
  onChange: (value: string) => void;
  error?: string | null;
  required?: boolean;
  max: number;
}) {
  return (
    <Field.Root invalid={!!error} required={required}>
      <Field.Label>
        {label}
        {required && <Field.RequiredIndicator />}
      </Field.Label>
      <Textarea
        rows={3}
        value={value}
        maxLength={max}
        onChange={(e) => onChange(e.target.value)}
        bg="bg.subtle"
      />
      {helper && !error && <Field.HelperText>{helper}</Field.HelperText>}
      <Field.ErrorText>{error}</Field.ErrorText>
    </Field.Root>
  );
}
