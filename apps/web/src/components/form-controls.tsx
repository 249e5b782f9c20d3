import { type Control, type FieldPathByValue, type FieldValues, useController } from 'react-hook-form';
import { CheckField } from './check-field.js';
import { type Choice, SelectInput } from './select-field.js';

// The select and the checkbox of a react-hook-form form, bound by name. SelectInput and CheckField
// stay free of the form library for the screens that use them outside a form.

interface SelectControlProps<T extends FieldValues, Out extends FieldValues> {
  control: Control<T, unknown, Out>;
  name: FieldPathByValue<T, string>;
  choices: Choice[];
  placeholder?: string;
  disabled?: boolean;
}

export function SelectControl<T extends FieldValues, Out extends FieldValues>({
  control,
  name,
  ...select
}: SelectControlProps<T, Out>) {
  const { field } = useController({ control, name });
  return <SelectInput {...select} value={field.value} onChange={field.onChange} />;
}

interface CheckControlProps<T extends FieldValues, Out extends FieldValues> {
  control: Control<T, unknown, Out>;
  name: FieldPathByValue<T, boolean>;
  label: string;
  disabled?: boolean;
}

export function CheckControl<T extends FieldValues, Out extends FieldValues>({
  control,
  name,
  ...check
}: CheckControlProps<T, Out>) {
  const { field } = useController({ control, name });
  return <CheckField {...check} checked={field.value} onChange={field.onChange} />;
}
