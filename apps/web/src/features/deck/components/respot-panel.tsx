import { useState } from 'react';
import { Box, Button, Flex, Heading, Stack, Table, Text } from '@chakra-ui/react';
import { closedCycleTakes, type LineupSnapshot, type RespotTarget } from '@catline/contracts';
import { NoticeBanner, refusalNotice, useNotice } from '../../../components/refusal-notice.js';
import { SelectInput } from '../../../components/select-field.js';
import { useShipClock } from '../../../lib/ship-time.js';
import { useHasRole } from '../../../lib/session-store.js';
import { useBuildRespot } from '../api/build-respot.js';
import { useRespotTowDone } from '../api/respot-tow-done.js';
import {
  positionFromKey,
  positionKey,
  positionLabel,
  respotCandidates,
  respotSteps,
  type DeckPanel,
} from '../deck-model.js';

/**
 * The respot for the coming recovery: the handler gives each aircraft where it is to be (an airborne one,
 * where it lands) and Catline answers with the tows in order; the deck crew's tows are ticked off here.
 */
export function RespotPanel({
  snapshot,
  panels,
  live,
}: {
  snapshot: LineupSnapshot;
  panels: readonly DeckPanel[];
  live: boolean;
}) {
  const { clock } = useShipClock();
  const handler = useHasRole('handler') && (snapshot.cycle.state !== 'closed' || closedCycleTakes('respot_built'));
  const cycleId = snapshot.cycle.id;
  const [chosen, setChosen] = useState<Record<number, string>>({});
  const build = useBuildRespot(cycleId);
  const towDone = useRespotTowDone(cycleId);
  const { notice, show, dismiss } = useNotice();
  const steps = respotSteps(snapshot);
  const places = panels.flatMap((panel) => panel.places.map((place) => place.position));
  const onBuild = () => {
    const targets: RespotTarget[] = Object.entries(chosen)
      .filter(([, to]) => to !== '')
      .map(([slotId, to]) => ({ slotId: Number(slotId), to: positionFromKey(to) }));
    build.mutate(
      { targets, basisVersion: snapshot.version },
      { onError: (error) => show(refusalNotice(error, 'The respot')) },
    );
  };
  return (
    <Stack gap="1" borderWidth="1px" rounded="md" p="2" as="section" aria-label="Respot" data-testid="respot">
      <Heading as="h2" size="md">
        Respot for the recovery
      </Heading>
      {notice && <NoticeBanner notice={notice} onDismiss={dismiss} />}
      {steps.length > 0 ? (
        <Stack as="ol" gap="1" listStyleType="none" ps="0">
          {steps.map((step) => (
            <Flex as="li" key={step.step} gap="2" align="center" minH="tap" data-testid={`respot-tow-${step.step}`}>
              <Text fontWeight="700" minW="2rem">
                {step.step}.
              </Text>
              <Text flex="1">
                {step.sideNumber}: {positionLabel(step.from)} → {positionLabel(step.to)}
              </Text>
              {step.doneAt ? (
                <Text fontSize="sm" color="fg.muted">
                  done {clock(step.doneAt)}
                </Text>
              ) : (
                handler &&
                step.next && (
                  <Button
                    minH="tap"
                    colorPalette="accent"
                    disabled={!live}
                    onClick={() =>
                      towDone.mutate(
                        { step: step.step, basisVersion: snapshot.version },
                        { onError: (error) => show(refusalNotice(error, `Tow ${step.step}`)) },
                      )
                    }
                  >
                    Done
                  </Button>
                )
              )}
            </Flex>
          ))}
        </Stack>
      ) : (
        <Text fontSize="sm" color="fg.muted">
          {snapshot.cycle.respot ? 'Every aircraft is where the respot wants it.' : 'No respot yet.'}
        </Text>
      )}
      {handler && (
        <Box as="details">
          <Box as="summary" cursor="pointer" minH="tap" pt="2">
            {snapshot.cycle.respot ? 'Build the respot again' : 'Build the respot'}
          </Box>
          <Table.Root size="sm">
            <Table.Header>
              <Table.Row>
                <Table.ColumnHeader>Aircraft</Table.ColumnHeader>
                <Table.ColumnHeader>Now</Table.ColumnHeader>
                <Table.ColumnHeader>After the respot</Table.ColumnHeader>
              </Table.Row>
            </Table.Header>
            <Table.Body>
              {respotCandidates(snapshot).map(({ slot, now }) => (
                <Table.Row key={slot.id}>
                  <Table.Cell fontWeight="700">{slot.sideNumber}</Table.Cell>
                  <Table.Cell>{now ? positionLabel(now) : 'airborne'}</Table.Cell>
                  <Table.Cell>
                    <SelectInput
                      value={chosen[slot.id] ?? ''}
                      placeholder={now ? 'Stays' : 'Not given'}
                      ariaLabel={`${slot.sideNumber} after the respot`}
                      choices={places.map((position) => ({
                        value: positionKey(position),
                        label: positionLabel(position),
                      }))}
                      onChange={(value) => setChosen((current) => ({ ...current, [slot.id]: value }))}
                    />
                  </Table.Cell>
                </Table.Row>
              ))}
            </Table.Body>
          </Table.Root>
          <Button mt="1" minH="tap" colorPalette="accent" disabled={!live} onClick={onBuild}>
            Work out the tows
          </Button>
        </Box>
      )}
    </Stack>
  );
}
