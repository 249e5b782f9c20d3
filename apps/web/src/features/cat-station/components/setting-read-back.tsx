import { Field, Input, Stack, Text } from '@chakra-ui/react';
import type { SlotView } from '@catline/contracts';
import { formatPounds } from '../../../lib/format.js';

interface SettingReadBackProps {
  slot: SlotView;
  typed: string;
  onType: (text: string) => void;
  onSubmit: () => void;
}

/**
 * The two-person check: the crew types the setting they read on the catapult's console, and the server
 * takes the step only when it equals the approved setting for the agreed weight. The approved figure is
 * not filled in for them: the check is that the console and the launch data agree.
 */
export function SettingReadBack({ slot, typed, onType, onSubmit }: SettingReadBackProps) {
  return (
    <Stack gridColumn="1 / -1" gap="2" data-testid="setting-read-back">
      <Field.Root>
        <Field.Label fontSize="lg" fontWeight="700">
          Setting on the console
        </Field.Label>
        <Input
          h="touch"
          maxW="12rem"
          fontSize="3xl"
          fontWeight="700"
          textAlign="center"
          inputMode="numeric"
          pattern="[0-9]*"
          autoComplete="off"
          enterKeyHint="done"
          value={typed}
          onChange={(event) => onType(event.target.value)}
          onKeyDown={(event) => event.key === 'Enter' && onSubmit()}
          data-testid="setting-read-back-input"
        />
        <Field.HelperText color="fg" fontSize="md">
          Read it off the console and type it in; it must equal the approved setting for{' '}
          {formatPounds(slot.agreedWeightLb ?? slot.grossWeightLb)}.
        </Field.HelperText>
      </Field.Root>
      {slot.weightAgreedBy && (
        <Text fontSize="sm" color="fg.muted">
          Weight agreed by {slot.weightAgreedBy}.
        </Text>
      )}
    </Stack>
  );
}
