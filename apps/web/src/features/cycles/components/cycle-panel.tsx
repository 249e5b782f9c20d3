import { Badge, Button, Flex, Heading, HStack, Stack, Text } from '@chakra-ui/react';
import { Link as RouterLink } from 'react-router-dom';
import type { CycleView } from '@catline/contracts';
import { CautionLine } from '../../../components/caution-line.js';
import { ClosedCycleNotice } from '../../../components/closed-cycle-notice.js';
import { NoticeBanner, refusalNotice, useNotice } from '../../../components/refusal-notice.js';
import { RoleGate } from '../../../components/role-gate.js';
import { errorMessage } from '../../../lib/api-error.js';
import { useHasRole } from '../../../lib/session-store.js';
import { useEndCycleStep } from '../api/end-cycle-step.js';
import { useUpdateConditions } from '../api/update-conditions.js';
import { toConditionsRequest, valuesFromCycle } from '../cycle-form-model.js';
import { AddSlotForm } from './add-slot-form.js';
import { AirPlanImport } from './air-plan-import.js';
import { CycleForm } from './cycle-form.js';
import { LaunchPrerequisites } from './launch-prerequisites.js';
import { LaunchingControls } from './launching-controls.js';

/** One cycle: its conditions (editable by air operations), the air boss's start and stop, closing, and adding aircraft. */
export function CyclePanel({ cycle }: { cycle: CycleView }) {
  const airOps = useHasRole('air_operations');
  const update = useUpdateConditions(cycle.id);
  const close = useEndCycleStep(cycle.id, 'close');
  const { notice, show, dismiss } = useNotice();

  return (
    <Stack
      gap="4"
      borderWidth="1px"
      rounded="card"
      p={{ base: '3', md: '4' }}
      bg="bg.panel"
      as="section"
      aria-label={`Cycle ${cycle.number}`}
      data-testid="cycle-panel"
    >
      <ClosedCycleNotice cycle={cycle} />
      <Flex gap="3" align="center" wrap="wrap" justify="space-between">
        <HStack gap="3">
          <Heading as="h2" size="lg">
            Cycle {cycle.number}
          </Heading>
          <Badge colorPalette={cycle.state === 'executing' ? 'go' : 'gray'} variant="solid">
            {cycle.state}
          </Badge>
        </HStack>
        <HStack gap="2" wrap="wrap">
          <Button asChild size="sm" variant="outline">
            <RouterLink to={`/lineup?cycle=${cycle.id}`}>Open lineup</RouterLink>
          </Button>
          <RoleGate roles={['air_boss']}>
            <LaunchingControls cycle={cycle} onRefused={show} />
          </RoleGate>
          <RoleGate roles={['air_operations']}>
            {cycle.state === 'executing' && (
              <Button
                size="sm"
                colorPalette="nogo"
                variant="outline"
                loading={close.isPending}
                onClick={() =>
                  close.mutate(cycle.version, { onError: (error) => show(refusalNotice(error, 'Closing')) })
                }
              >
                Close cycle
              </Button>
            )}
          </RoleGate>
        </HStack>
      </Flex>
      {/* Gross weights are launch figures: the aircraft added below and the air-plan preview show them. */}
      <CautionLine />
      {notice && <NoticeBanner notice={notice} onDismiss={dismiss} />}
      <LaunchPrerequisites cycle={cycle} onRefused={show} />
      <Stack gap="2">
        <Text fontWeight="700">Conditions</Text>
        <CycleForm
          key={`${cycle.id}-${cycle.version}`}
          initial={valuesFromCycle(cycle)}
          withNumber={false}
          timeZone={cycle.timeZone}
          readOnly={!airOps || cycle.state === 'closed'}
          submitLabel="Save conditions"
          pending={update.isPending}
          serverError={update.isError ? errorMessage(update.error) : null}
          onSubmit={(values) => update.mutate(toConditionsRequest(values, cycle))}
        />
        {update.isSuccess && (
          <Text color="go.fg" fontSize="sm" role="status">
            Conditions saved; every launch figure has been worked out again.
          </Text>
        )}
      </Stack>
      <RoleGate roles={['air_operations']}>
        {cycle.state !== 'closed' && (
          <Stack gap="2">
            <Text fontWeight="700">Add an aircraft</Text>
            <AddSlotForm cycleId={cycle.id} />
          </Stack>
        )}
        {cycle.state !== 'closed' && (
          <Stack gap="2" as="section" aria-label="Import an air plan">
            <Text fontWeight="700">Import an air plan</Text>
            <AirPlanImport cycle={cycle} />
          </Stack>
        )}
      </RoleGate>
    </Stack>
  );
}
