import { Alert, Button, Field, Flex, Input, Text } from '@chakra-ui/react';
import type { AircraftTypeView } from '@catline/contracts';
import { useState } from 'react';
import { FigureStat } from '../../../components/figure-stat.js';
import { errorMessage } from '../../../lib/api-error.js';
import { holdbackElementText } from '../aircraft-type-model.js';
import { useSetHoldbackElement } from '../api/set-holdback-element.js';

/** The holdback release element the Cat station names at the hook-up; the admin changes it in place. */
export function HoldbackElementField({ type, editable }: { type: AircraftTypeView; editable: boolean }) {
  const save = useSetHoldbackElement();
  const [typed, setTyped] = useState(type.holdbackElement ?? '');
  const parsed = holdbackElementText.safeParse(typed);
  const problem = parsed.success ? null : parsed.error.issues[0]?.message;
  if (!editable) return <FigureStat label="Holdback element" value={type.holdbackElement ?? 'Not entered'} size="md" />;
  return (
    <Field.Root gap="1" invalid={Boolean(problem)}>
      <Text fontSize="xs" textTransform="uppercase" letterSpacing="wider" color="fg.muted" fontWeight="600">
        Holdback element
      </Text>
      <Flex gap="2">
        <Input
          value={typed}
          onChange={(event) => setTyped(event.target.value)}
          aria-label={`Holdback release element of ${type.designation}`}
          placeholder="Not entered"
          size="sm"
        />
        <Button
          size="sm"
          variant="outline"
          disabled={!parsed.success || parsed.data === type.holdbackElement || save.isPending}
          loading={save.isPending}
          onClick={() => parsed.success && save.mutate({ typeId: type.id, holdbackElement: parsed.data })}
        >
          Save
        </Button>
      </Flex>
      {problem && <Field.ErrorText>{problem}</Field.ErrorText>}
      {save.isError && (
        <Alert.Root status="error" colorPalette="nogo" role="alert">
          <Alert.Indicator />
          <Alert.Title>{errorMessage(save.error)}</Alert.Title>
        </Alert.Root>
      )}
    </Field.Root>
  );
}
