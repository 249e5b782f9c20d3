import { Button, SimpleGrid, Text } from '@chakra-ui/react';
import { READINESS_STEPS, type AdvanceSlotRequest, type SlotView } from '@catline/contracts';
import { formatPounds } from '../../../lib/format.js';
import { STEP_LABELS, stepIndex } from '../cat-station-model.js';

interface ReadinessStepsProps {
  slot: SlotView;
  pending: boolean;
  onAdvance: (to: AdvanceSlotRequest['to']) => void;
}

/** One big button per readiness step; only the next one is live, done ones stay visible as done. */
export function ReadinessSteps({ slot, pending, onAdvance }: ReadinessStepsProps) {
  if (slot.status === 'suspended') {
    return (
      <Button
        h="touch"
        fontSize="xl"
        colorPalette="caution"
        onClick={() => onAdvance('resume')}
        loading={pending}
        data-testid="resume"
      >
        Resume: back on the catapult
      </Button>
    );
  }
  const done = stepIndex(slot);
  const waitingForPilot = !slot.pilotWeightAckAt;
  return (
    <SimpleGrid columns={{ base: 1, sm: 2 }} gap="3" role="group" aria-label="Readiness steps">
      {READINESS_STEPS.map((step, index) => {
        const isDone = index <= done;
        const isNext = index === done + 1;
        const blocked = isNext && step === 'weight_agreed' && waitingForPilot;
        return (
          <Button
            key={step}
            h="touch"
            fontSize="lg"
            variant={isDone ? 'subtle' : isNext ? 'solid' : 'outline'}
            colorPalette={isDone ? 'go' : 'accent'}
            disabled={!isNext || blocked || pending}
            loading={isNext && pending}
            onClick={() => onAdvance(step)}
            data-testid={`step-${step}`}
            data-done={isDone || undefined}
            // A done step stays fully readable: it is a record, not a greyed-out control.
            _disabled={isDone ? { opacity: 1, cursor: 'default' } : undefined}
            whiteSpace="normal"
          >
            {isDone ? `✓ ${STEP_LABELS[step]}` : STEP_LABELS[step]}
          </Button>
        );
      })}
      {done + 1 === READINESS_STEPS.indexOf('weight_agreed') && waitingForPilot && (
        <Text gridColumn="1 / -1" color="caution.fg" fontWeight="600" data-testid="waiting-for-pilot">
          Waiting for the pilot to acknowledge {formatPounds(slot.grossWeightLb)}.
        </Text>
      )}
    </SimpleGrid>
  );
}
