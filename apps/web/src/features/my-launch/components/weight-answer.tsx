import { useState } from 'react';
import { Button, HStack, Input, Stack, Text } from '@chakra-ui/react';
import type { SlotView } from '@catline/contracts';
import { FigureStat } from '../../../components/figure-stat.js';
import { formatPounds } from '../../../lib/format.js';
import { useShipClock } from '../../../lib/ship-time.js';
import { weightAnswer } from '../my-launch-model.js';

interface WeightAnswerProps {
  slot: SlotView;
  pending: boolean;
  onAnswer: (grossWeightLb: number) => void;
}

/** The crew shows the weight; the pilot agrees with one tap, or answers the figure they hold. */
export function WeightAnswer({ slot, pending, onAnswer }: WeightAnswerProps) {
  const { clock } = useShipClock();
  const [typed, setTyped] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const closed = slot.status === 'launched' || slot.status === 'down' || slot.status === 'scratched';
  // Once the crew recorded a figure, agreeing the plan again would take that agreement back: only a
  // different figure, typed on purpose, may still be answered.
  const agreedLb = slot.catapultWeightAckAt !== null ? slot.agreedWeightLb : null;
  const agreedByCrew = agreedLb !== null;
  const answer = () => {
    const read = weightAnswer(typed);
    if ('problem' in read) return setProblem(read.problem);
    setProblem(null);
    onAnswer(read.weight);
  };
  return (
    <Stack gap="3" borderWidth="1px" rounded="card" p={{ base: '3', md: '4' }} as="section" aria-label="Gross weight">
      <FigureStat
        label={agreedByCrew ? 'Gross weight agreed' : 'Gross weight shown by the crew'}
        value={formatPounds(agreedLb ?? slot.grossWeightLb)}
        size="xl"
      />
      {slot.agreedWeightLb !== null && (
        <Text color="go.fg" fontWeight="600" data-testid="weight-agreed">
          Agreed with the crew: {formatPounds(slot.agreedWeightLb)}.
        </Text>
      )}
      {slot.pilotWeightAckAt && slot.pilotWeightAckLb !== null && (
        <Text fontWeight="600" data-testid="weight-acknowledged">
          You answered {formatPounds(slot.pilotWeightAckLb)} at {clock(slot.pilotWeightAckAt)}.
        </Text>
      )}
      {!closed && (
        <>
          {!agreedByCrew && (
            <Button
              h="touch"
              fontSize="lg"
              colorPalette="accent"
              alignSelf={{ base: 'stretch', md: 'flex-start' }}
              loading={pending}
              data-testid="acknowledge-weight"
              onClick={() => onAnswer(slot.grossWeightLb)}
            >
              I agree {formatPounds(slot.grossWeightLb)}
            </Button>
          )}
          <HStack gap="2" align="stretch">
            <Input
              aria-label="A different gross weight, lb"
              placeholder="Different figure, lb"
              inputMode="numeric"
              value={typed}
              onChange={(event) => setTyped(event.currentTarget.value)}
              h="touch"
              fontSize="lg"
              data-testid="weight-correction"
            />
            <Button h="touch" variant="outline" disabled={pending} onClick={answer} data-testid="answer-weight">
              Answer
            </Button>
          </HStack>
          {problem && (
            <Text color="nogo.fg" fontWeight="600">
              {problem}
            </Text>
          )}
        </>
      )}
    </Stack>
  );
}
