import { Button, SimpleGrid, Text } from '@chakra-ui/react';
import type { AdvanceSlotRequest, ReadinessStep, SlotView } from '@catline/contracts';
import { formatPounds } from '../../../lib/format.js';
import { STEP_LABELS } from '../../../lib/readiness-step-labels.js';
import { stepIndex, weightToRecord } from '../cat-station-model.js';

interface ReadinessStepsProps {
  slot: SlotView;
  steps: readonly ReadinessStep[];
  night: boolean;
  pending: boolean;
  onAdvance: (request: Omit<AdvanceSlotRequest, 'slotVersion'>) => void;
}

function label(step: ReadinessStep, slot: SlotView, night: boolean): string {
  if (step === 'weight_agreed')
    return `${STEP_LABELS[step]}: ${formatPounds(slot.agreedWeightLb ?? weightToRecord(slot))}`;
  if (step === 'pilot_ready') return `${STEP_LABELS[step]} (${night ? 'lights on' : 'salute'})`;
  return STEP_LABELS[step];
}

/** One big button per step of the ship's list, one tap each; only the next one is live, done ones stay as a record. */
export function ReadinessSteps({ slot, steps, night, pending, onAdvance }: ReadinessStepsProps) {
  if (slot.status === 'suspended') {
    return (
      <Button
        h="touch"
        fontSize="xl"
        colorPalette="caution"
        onClick={() => onAdvance({ to: 'resume' })}
        loading={pending}
        data-testid="resume"
      >
        Resume: back on the catapult
      </Button>
    );
  }
  const done = stepIndex(slot, steps);
  const answered = slot.pilotWeightAckLb;
  return (
    <SimpleGrid columns={{ base: 1, sm: 2 }} gap="3" role="group" aria-label="Readiness steps">
      {steps.map((step, index) => {
        const isDone = index <= done;
        const isNext = index === done + 1;
        return (
          <Button
            key={step}
            h="touch"
            fontSize="lg"
            variant={isDone ? 'subtle' : isNext ? 'solid' : 'outline'}
            colorPalette={isDone ? 'go' : 'accent'}
            disabled={!isNext || pending}
            loading={isNext && pending}
            onClick={() =>
              onAdvance(step === 'weight_agreed' ? { to: step, agreedWeightLb: weightToRecord(slot) } : { to: step })
            }
            data-testid={`step-${step}`}
            data-done={isDone || undefined}
            // A done step stays fully readable: it is a record, not a greyed-out control.
            _disabled={isDone ? { opacity: 1, cursor: 'default' } : undefined}
            whiteSpace="normal"
          >
            {isDone ? `✓ ${label(step, slot, night)}` : label(step, slot, night)}
          </Button>
        );
      })}
      {steps[done + 1] === 'weight_agreed' && (
        <Text gridColumn="1 / -1" fontWeight="600" data-testid="pilot-weight">
          {answered === null
            ? `Show the pilot ${formatPounds(slot.grossWeightLb)}; record it when the pilot agrees by signal.`
            : answered === slot.grossWeightLb
              ? `The pilot agrees ${formatPounds(answered)} on the tablet.`
              : `The pilot answers ${formatPounds(answered)} (planned ${formatPounds(slot.grossWeightLb)}).`}
        </Text>
      )}
    </SimpleGrid>
  );
}
