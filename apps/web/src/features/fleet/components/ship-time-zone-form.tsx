import { useState } from 'react';
import { Alert, Button, HStack, Input, Stack, Text } from '@chakra-ui/react';
import { isKnownTimeZone, shipClock, shipTimeZone, type ShipView } from '@catline/contracts';
import { FormField } from '../../../components/form-field.js';
import { errorMessage } from '../../../lib/api-error.js';
import { useSaveShipTimeZone } from '../api/save-ship-time-zone.js';

/** The admin sets the zone the ship keeps; every screen, mail and export tells its times in it. */
export function ShipTimeZoneForm({ ship }: { ship: ShipView }) {
  const [zone, setZone] = useState(shipTimeZone(ship.profile));
  const save = useSaveShipTimeZone();
  const name = zone.trim();
  const known = name !== '' && isKnownTimeZone(name);
  return (
    <form
      aria-label="Ship's time zone"
      noValidate
      onSubmit={(event) => {
        event.preventDefault();
        if (known) save.mutate({ ship, timeZone: name });
      }}
    >
      <Stack gap="2" borderWidth="1px" rounded="card" p="3">
        {save.isError && (
          <Alert.Root status="error" colorPalette="nogo" role="alert">
            <Alert.Indicator />
            <Alert.Title>{errorMessage(save.error)}</Alert.Title>
          </Alert.Root>
        )}
        <HStack gap="3" align="flex-end" wrap="wrap">
          <FormField
            label="Ship's time zone"
            required
            error={known ? undefined : 'Enter a time zone name such as Asia/Dubai or UTC.'}
            helper={known ? `Ship's clock now: ${shipClock(new Date(), name)}` : undefined}
          >
            <Input size="sm" maxW="16rem" value={zone} onChange={(event) => setZone(event.currentTarget.value)} />
          </FormField>
          <Button type="submit" size="sm" disabled={!known} loading={save.isPending}>
            Save time zone
          </Button>
        </HStack>
        {save.isSuccess && (
          <Text color="go.fg" fontSize="sm" role="status">
            Saved: every time is now shown on the ship's clock in {name}.
          </Text>
        )}
      </Stack>
    </form>
  );
}
