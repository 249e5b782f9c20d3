import type { ReactNode } from 'react';
import { Field } from '@chakra-ui/react';

interface FormFieldProps {
  label: string;
  error?: string;
  helper?: string;
  required?: boolean;
  children: ReactNode;
}

/** Label, control and the reason it is refused, tied together for screen readers. */
export function FormField({ label, error, helper, required, children }: FormFieldProps) {
  return (
    <Field.Root invalid={Boolean(error)} required={required}>
      <Field.Label>
        {label}
        {required && <Field.RequiredIndicator />}
      </Field.Label>
      {children}
      {helper && !error && <Field.HelperText>{helper}</Field.HelperText>}
      {error && <Field.ErrorText>{error}</Field.ErrorText>}
    </Field.Root>
  );
}
