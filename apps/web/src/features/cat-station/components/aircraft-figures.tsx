import { Box, SimpleGrid, Stack, Text } from '@chakra-ui/react';
import type { SlotView } from '@catline/contracts';
import { FigureStat } from '../../../components/figure-stat.js';
import { GrossWeightParts, storesLines } from '../../../components/gross-weight-parts.js';
import { formatKnots, formatPounds, formatSignedKnots } from '../../../lib/format.js';
import { useShipClock, type ShipClock } from '../../../lib/ship-time.js';
import { excessTone, marginTone } from '../../../lib/figure-tones.js';
import { crossCheckWarning } from '../launch-setting-model.js';

function agreement(at: string | null, clock: ShipClock['clock']) {
  return at ? `Yes, ${clock(at)}` : 'Not yet';
}

/** Armed or safe with who recorded it and when; "Not recorded" until the crew does. */
function armState({ armState: state, armStateAt: at, armStateBy: by }: SlotView, clock: ShipClock['clock']) {
  if (!state || !at) return 'Not recorded';
  return `${state === 'armed' ? 'Armed' : 'Safe'}, ${clock(at)} by ${by ?? 'the crew'}`;
}

/** The launch figures of the aircraft on the catapult, large enough for a glance from the deck edge. */
export function AircraftFigures({ slot }: { slot: SlotView }) {
  const { clock } = useShipClock();
  const figures = slot.figures;
  const warning = figures && crossCheckWarning(figures);
  // Once agreed, the setting, trim and afterburner rest on the agreed figure: the weight beside them is that one.
  const agreedLb = slot.catapultWeightAckAt ? slot.agreedWeightLb : null;
  return (
    <Stack gap="3">
      <SimpleGrid columns={{ base: 2, md: 3 }} gap="3" data-testid="cat-figures">
        <FigureStat
          label={agreedLb === null ? 'Gross weight (planned)' : 'Gross weight (agreed)'}
          value={formatPounds(agreedLb ?? slot.grossWeightLb)}
          size="xl"
        />
        <FigureStat
          label="Agreed by pilot"
          value={agreement(slot.pilotWeightAckAt, clock)}
          tone={slot.pilotWeightAckAt ? 'go' : 'caution'}
          size="md"
        />
        <FigureStat
          label="Agreed by me"
          value={agreement(slot.catapultWeightAckAt, clock)}
          tone={slot.catapultWeightAckAt ? 'go' : 'caution'}
          size="md"
        />
        <FigureStat
          label="Catapult setting (approved data)"
          value={figures?.catapultSetting ?? 'None approved'}
          tone={figures?.catapultSetting == null ? 'nogo' : undefined}
          size="xl"
        />
        <FigureStat
          label="Energy model cross-check"
          value={figures?.crossCheckSetting ?? 'No setting'}
          tone={figures?.crossCheckFlagged ? 'caution' : undefined}
          size="md"
        />
        <FigureStat label="End speed" value={figures ? formatKnots(figures.endSpeedKt) : '—'} />
        <FigureStat label="Required wind over deck" value={formatKnots(figures?.requiredWindOverDeckKt ?? null)} />
        <FigureStat label="Headwind" value={figures ? formatKnots(figures.headwindKt) : '—'} />
        <FigureStat
          label="Excess wind over deck"
          value={formatSignedKnots(figures?.excessWindOverDeckKt ?? null)}
          tone={excessTone(figures?.excessWindOverDeckKt ?? null, figures?.recommendedExcessKt ?? null)}
        />
        <FigureStat label="Recommended excess" value={formatKnots(figures?.recommendedExcessKt ?? null)} />
        <FigureStat
          label="Margin"
          value={formatSignedKnots(figures?.marginKt ?? null)}
          tone={marginTone(figures?.marginKt ?? null, figures?.excessWindOverDeckKt ?? null)}
          size="xl"
        />
        <FigureStat label="Trim" value={slot.trimDeg === null ? '—' : `${slot.trimDeg}°`} />
        <FigureStat
          label="Afterburner"
          value={slot.afterburnerRequired ? 'Required' : 'Not required'}
          tone={slot.afterburnerRequired ? 'caution' : undefined}
        />
        <FigureStat
          label="Armed or safe"
          value={armState(slot, clock)}
          tone={slot.armState === 'armed' ? 'caution' : undefined}
          size="md"
        />
      </SimpleGrid>
      {warning && (
        <Text role="alert" color="caution.fg" fontWeight="600" data-testid="setting-cross-check">
          {warning}
        </Text>
      )}
      {slot.grossWeightParts && (
        <Box data-testid="cat-weight-parts">
          <GrossWeightParts parts={slot.grossWeightParts} fontSize="sm" />
          <Text fontSize="sm" color="fg.muted">
            Stores: {storesLines(slot.grossWeightParts)}
          </Text>
        </Box>
      )}
    </Stack>
  );
}
