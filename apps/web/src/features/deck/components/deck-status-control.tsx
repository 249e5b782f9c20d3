import { useState } from 'react';
import { Button, HStack, Input, SimpleGrid, Stack, Text } from '@chakra-ui/react';
import type { LaneView, LineupSnapshot } from '@catline/contracts';
import { DeckStatusLine } from '../../../components/deck-status-line.js';
import { NoticeBanner, refusalNotice, useNotice } from '../../../components/refusal-notice.js';
import { useHasRole } from '../../../lib/session-store.js';
import { useSetDeckStatus } from '../api/set-deck-status.js';

/** One catapult's deck status; the air boss holds it with a reason or clears it to launch. */
function CatapultDeckStatus({ lane, snapshot, sets }: { lane: LaneView; snapshot: LineupSnapshot; sets: boolean }) {
  const [reason, setReason] = useState('');
  const [touched, setTouched] = useState(false);
  const setDeckStatus = useSetDeckStatus(snapshot.cycle.id);
  const { notice, show, dismiss } = useNotice();
  const missingReason = reason.trim().length === 0;
  const send = (clear: boolean) =>
    setDeckStatus.mutate(
      { catapultId: lane.catapultId, clear, reason: clear ? null : reason.trim(), basisVersion: snapshot.version },
      {
        onSuccess: () => {
          setReason('');
          setTouched(false);
        },
        onError: (error) => show(refusalNotice(error, `The deck status of cat ${lane.number}`)),
      },
    );
  return (
    <Stack gap="1" data-testid="catapult-deck-status" data-catapult-number={lane.number}>
      <HStack gap="2" minW="0">
        <Text fontWeight="700" flexShrink={0}>
          Cat {lane.number}
        </Text>
        <DeckStatusLine lane={lane} />
      </HStack>
      {notice && <NoticeBanner notice={notice} onDismiss={dismiss} />}
      {sets &&
        (lane.deckClear ? (
          <Stack gap="1">
            <HStack gap="2" wrap="wrap">
              <Input
                aria-label={`Why cat ${lane.number} is not clear`}
                aria-invalid={touched && missingReason}
                placeholder="What keeps it from launching"
                value={reason}
                maxLength={200}
                onChange={(event) => setReason(event.currentTarget.value)}
                maxW="16rem"
                minH="tap"
              />
              <Button
                minH="tap"
                colorPalette="nogo"
                variant="outline"
                loading={setDeckStatus.isPending}
                onClick={() => {
                  setTouched(true);
                  if (!missingReason) send(false);
                }}
              >
                Hold cat {lane.number}: not clear
              </Button>
            </HStack>
            {touched && missingReason && (
              <Text fontSize="sm" color="nogo.fg" role="alert">
                Say what keeps cat {lane.number} from launching.
              </Text>
            )}
          </Stack>
        ) : (
          <Button
            minH="tap"
            alignSelf="start"
            colorPalette="go"
            loading={setDeckStatus.isPending}
            onClick={() => send(true)}
          >
            Clear cat {lane.number} to launch
          </Button>
        ))}
    </Stack>
  );
}

/**
 * The deck status of every catapult of the cycle. Not clear is a hard stop the server enforces on the
 * launch; only the air boss sets it, so only the air boss sees the controls.
 */
export function DeckStatusControl({ snapshot }: { snapshot: LineupSnapshot }) {
  const sets = useHasRole('air_boss') && snapshot.cycle.state !== 'closed';
  const lanes = [...snapshot.lanes].sort((a, b) => a.number - b.number);
  return (
    <Stack
      gap="2"
      borderWidth="1px"
      rounded="md"
      p="2"
      as="section"
      aria-label="Deck status"
      data-testid="deck-status-control"
    >
      <Text fontWeight="700">Deck status</Text>
      <SimpleGrid columns={{ base: 1, sm: 2, xl: 4 }} gap="3">
        {lanes.map((lane) => (
          <CatapultDeckStatus key={lane.catapultId} lane={lane} snapshot={snapshot} sets={sets} />
        ))}
      </SimpleGrid>
    </Stack>
  );
}
