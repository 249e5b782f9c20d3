import { NativeSelect } from '@chakra-ui/react';

export interface Choice {
  value: string;
  label: string;
}

/** A native select: the best picker on a tablet or phone. */
interface SelectInputProps {
  value: string;
  choices: Choice[];
  onChange: (value: string) => void;
  disabled?: boolean;
  placeholder?: string;
  ariaLabel?: string;
  /** Keeps a select readable inside a table column that would squeeze it. */
  minW?: string;
}

export function SelectInput({ value, choices, onChange, disabled, placeholder, ariaLabel, minW }: SelectInputProps) {
  return (
    <NativeSelect.Root disabled={disabled} minW={minW}>
      <NativeSelect.Field
        value={value}
        onChange={(event) => onChange(event.currentTarget.value)}
        aria-label={ariaLabel}
      >
        {placeholder !== undefined && <option value="">{placeholder}</option>}
        {choices.map((choice) => (
          <option key={choice.value} value={choice.value}>
            {choice.label}
          </option>
        ))}
      </NativeSelect.Field>
      <NativeSelect.Indicator />
    </NativeSelect.Root>
  );
}
