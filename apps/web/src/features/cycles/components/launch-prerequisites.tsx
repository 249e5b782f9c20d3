import { Badge, HStack, Stack, Text } from '@chakra-ui/react';
import type { CycleView } from '@catline/contracts';
import { CheckField } from '../../../components/check-field.js';
import type { Notice } from '../../../components/refusal-notice.js';
import { refusalNotice } from '../../../components/refusal-notice.js';
import { useShipClock } from '../../../lib/ship-time.js';
import { useHasRole } from '../../../lib/session-store.js';
import { useSetLaunchPrerequisite } from '../api/set-launch-prerequisite.js';

/**
 * The ship's launch prerequisites for the cycle: the air boss ticks each (or takes a tick back) while the
 * cycle is in planning; everyone else reads who ticked what, and when.
 */
export function LaunchPrerequisites({ cycle, onRefused }: { cycle: CycleView; onRefused: (notice: Notice) => void }) {
  const { time } = useShipClock();
  const airBoss = useHasRole('air_boss');
  const set = useSetLaunchPrerequisite(cycle.id);
  if (cycle.launchPrerequisites.length === 0) return null;
  const editable = airBoss && cycle.state === 'planning';

  return (
    <Stack gap="2" as="section" aria-labelledby={`prerequisites-${cycle.id}`}>
      <Text fontWeight="700" id={`prerequisites-${cycle.id}`}>
        Launch prerequisites
      </Text>
      <Stack as="ul" gap="2" listStyleType="none" m="0" p="0">
        {cycle.launchPrerequisites.map((item, index) => (
          <HStack as="li" key={item.name} gap="3" wrap="wrap">
            {editable ? (
              <CheckField
                label={item.name}
                checked={item.ticked}
                disabled={set.isPending}
                onChange={(ticked) =>
                  set.mutate(
                    { number: index + 1, request: { ticked, basisVersion: cycle.version } },
                    {
                      onError: (error) => onRefused(refusalNotice(error, ticked ? 'Ticking' : 'Taking the tick back')),
                    },
                  )
                }
              />
            ) : (
              <>
                <Badge colorPalette={item.ticked ? 'go' : 'gray'} variant="solid">
                  {item.ticked ? 'Ticked' : 'Not ticked'}
                </Badge>
                <Text>{item.name}</Text>
              </>
            )}
            {item.ticked && (
              <Text fontSize="sm" color="fg.muted">
                by {item.tickedBy} at {time(item.tickedAt!)}
              </Text>
            )}
          </HStack>
        ))}
      </Stack>
    </Stack>
  );
}
