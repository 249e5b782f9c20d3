import { Button, SimpleGrid, Text } from '@chakra-ui/react';
import type { AdvanceSlotRequest, ReadinessStep, SlotView } from '@catline/contracts';
import { useState } from 'react';
import { formatPounds } from '../../../lib/format.js';
import { STEP_LABELS } from '../../../lib/readiness-step-labels.js';
import { holdbackLabel, readBackFigure, stepIndex, weightToRecord } from '../cat-station-model.js';
import { SettingReadBack } from './setting-read-back.js';

interface ReadinessStepsProps {
  slot: SlotView;
  steps: readonly ReadinessStep[];
  night: boolean;
  pending: boolean;
  onAdvance: (request: Omit<AdvanceSlotRequest, 'slotVersion'>) => void;
}

function label(step: ReadinessStep, slot: SlotView, night: boolean): string {
  if (step === 'on_catapult') return `${STEP_LABELS[step]} · ${holdbackLabel(slot)}`;
  if (step === 'weight_agreed')
    return `${STEP_LABELS[step]}: ${formatPounds(slot.agreedWeightLb ?? weightToRecord(slot))}`;
  if (step === 'setting_set' && slot.settingReadBack) return `${STEP_LABELS[step]}: ${slot.settingReadBack.setting}`;
  if (step === 'pilot_ready') return `${STEP_LABELS[step]} (${night ? 'lights on' : 'salute'})`;
  return STEP_LABELS[step];
}

/**
 * The figure typed from the console, kept for the slot as it was when typed: any change to the aircraft
 * (a drop-back, new figures) empties it, so a read-back is never sent against figures it was not read for.
 */
function useReadBackEntry(slot: SlotView) {
  const [entry, setEntry] = useState({ typed: '', version: slot.version });
  const typed = entry.version === slot.version ? entry.typed : '';
  return { typed, type: (text: string) => setEntry({ typed: text, version: slot.version }) };
}

/** One big button per step of the ship's list, one tap each; only the next one is live, done ones stay as a record. */
export function ReadinessSteps({ slot, steps, night, pending, onAdvance }: ReadinessStepsProps) {
  const entry = useReadBackEntry(slot);
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
  const readBack = readBackFigure(entry.typed);
  const request = (step: ReadinessStep): Omit<AdvanceSlotRequest, 'slotVersion'> | null => {
    if (step === 'weight_agreed') return { to: step, agreedWeightLb: weightToRecord(slot) };
    if (step === 'setting_set') return readBack === null ? null : { to: step, settingReadBack: readBack };
    return { to: step };
  };
  const nextRequest = steps[done + 1] ? request(steps[done + 1]) : null;
  return (
    <SimpleGrid columns={{ base: 1, sm: 2 }} gap="3" role="group" aria-label="Readiness steps">
      {steps.map((step, index) => {
        const isDone = index <= done;
        const isNext = index === done + 1;
        return (
          <Button
            key={step}
            h="auto"
            minH="touch"
            py="2"
            fontSize="lg"
            variant={isDone ? 'subtle' : isNext ? 'solid' : 'outline'}
            colorPalette={isDone ? 'go' : 'accent'}
            disabled={!isNext || pending || nextRequest === null}
            loading={isNext && pending}
            onClick={() => nextRequest && onAdvance(nextRequest)}
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
      {steps[done + 1] === 'on_catapult' && (
        <Text gridColumn="1 / -1" fontSize="xl" fontWeight="700" data-testid="holdback-element">
          {holdbackLabel(slot)}
        </Text>
      )}
      {steps[done + 1] === 'weight_agreed' && (
        <Text gridColumn="1 / -1" fontWeight="600" data-testid="pilot-weight">
          {answered === null
            ? `Show the pilot ${formatPounds(slot.grossWeightLb)}; record it when the pilot agrees by signal.`
            : answered === slot.grossWeightLb
              ? `The pilot agrees ${formatPounds(answered)} on the tablet.`
              : `The pilot answers ${formatPounds(answered)} (planned ${formatPounds(slot.grossWeightLb)}).`}
        </Text>
      )}
      {steps[done + 1] === 'setting_set' && (
        <SettingReadBack
          slot={slot}
          typed={entry.typed}
          onType={entry.type}
          onSubmit={() => nextRequest && !pending && onAdvance(nextRequest)}
        />
      )}
    </SimpleGrid>
  );
}
