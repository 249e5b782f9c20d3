import { useState } from 'react';
import { Alert, Box, Button, HStack, IconButton, Input, Stack, Text } from '@chakra-ui/react';
import type { ShipView } from '@catline/contracts';
import { ApiRequestError, errorMessage } from '../../../lib/api-error.js';
import { useSaveDeckLayout } from '../api/save-deck-layout.js';
import {
  type DeckDraft,
  type DraftArea,
  type DraftTaxi,
  applyAreaTaxi,
  blankArea,
  blankSpot,
  catapultNumbers,
  moved,
  problemsByPart,
  toDeckDraft,
  toDeckLayoutRequest,
} from '../deck-layout-model.js';

/** The server's sentences about one spot or elevator, shown beside it. */
function PartProblems({ sentences }: { sentences: string[] | undefined }) {
  if (!sentences || sentences.length === 0) return null;
  return (
    <Stack gap="0" role="alert">
      {sentences.map((sentence) => (
        <Text key={sentence} fontSize="sm" color="nogo.fg">
          {sentence}
        </Text>
      ))}
    </Stack>
  );
}

/** One input per catapult, named for screen readers as "<what> to catapult <n>". */
function TaxiInputs({
  taxi,
  catapults,
  what,
  onChange,
}: {
  taxi: DraftTaxi;
  catapults: number[];
  what: string;
  onChange: (taxi: DraftTaxi) => void;
}) {
  return (
    <>
      {catapults.map((number) => (
        <Input
          key={number}
          size="sm"
          w="4.5rem"
          inputMode="numeric"
          aria-label={`${what} to catapult ${number}, seconds`}
          value={taxi[number] ?? ''}
          onChange={(event) => onChange({ ...taxi, [number]: event.currentTarget.value })}
        />
      ))}
    </>
  );
}

function CatapultHeaders({ catapults, first }: { catapults: number[]; first: string }) {
  return (
    <HStack gap="2" fontSize="xs" fontWeight="600" color="fg.muted">
      <Text flex="1">{first}</Text>
      {catapults.map((number) => (
        <Text key={number} w="4.5rem">
          Cat {number} (s)
        </Text>
      ))}
      <Box w="7.5rem" />
    </HStack>
  );
}

interface AreaPanelProps {
  area: DraftArea;
  catapults: number[];
  problems: Map<string, string[]>;
  onChange: (area: DraftArea) => void;
  onRemove: () => void;
}

/** A deck area: its name, times to set for all its spots at once, and its spots front to back. */
function AreaPanel({ area, catapults, problems, onChange, onRemove }: AreaPanelProps) {
  const label = area.name || 'new area';
  const setSpot = (index: number, change: Partial<DraftArea['spots'][number]>) =>
    onChange({ ...area, spots: area.spots.map((spot, at) => (at === index ? { ...spot, ...change } : spot)) });
  return (
    <Stack as="section" aria-label={`Deck area ${label}`} gap="2" borderWidth="1px" rounded="card" p="3" bg="bg.panel">
      <HStack gap="2">
        <Input
          size="sm"
          maxW="14rem"
          fontWeight="700"
          aria-label={`Name of deck area ${label}`}
          value={area.name}
          onChange={(event) => onChange({ ...area, name: event.currentTarget.value })}
        />
        <Button size="xs" variant="ghost" colorPalette="nogo" onClick={onRemove}>
          Remove area
        </Button>
      </HStack>
      <HStack gap="2" flexWrap="wrap">
        <Text fontSize="sm" flex="1" minW="10rem">
          Taxi for every spot here
        </Text>
        <TaxiInputs
          taxi={area.taxi}
          catapults={catapults}
          what={`Taxi from area ${label}`}
          onChange={(taxi) => onChange({ ...area, taxi })}
        />
        <Button size="xs" variant="outline" w="7.5rem" onClick={() => onChange(applyAreaTaxi(area))}>
          Set on all spots
        </Button>
      </HStack>
      <CatapultHeaders catapults={catapults} first="Spot (front of the row first) · clear before it" />
      {area.spots.map((spot, index) => {
        const name = spot.name || `spot ${index + 1}`;
        return (
          <Stack key={index} gap="1">
            <HStack gap="2">
              <HStack flex="1" gap="1">
                <Input
                  size="sm"
                  aria-label={`Name of ${name} in ${label}`}
                  value={spot.name}
                  onChange={(event) => setSpot(index, { name: event.currentTarget.value })}
                />
                <Input
                  size="sm"
                  placeholder="none"
                  aria-label={`Spots clear before ${name}`}
                  value={spot.clearBefore}
                  onChange={(event) => setSpot(index, { clearBefore: event.currentTarget.value })}
                />
              </HStack>
              <TaxiInputs
                taxi={spot.taxi}
                catapults={catapults}
                what={`Taxi from ${name}`}
                onChange={(taxi) => setSpot(index, { taxi })}
              />
              <HStack gap="0" w="7.5rem">
                <IconButton
                  size="xs"
                  variant="ghost"
                  aria-label={`Move ${name} forward`}
                  onClick={() => onChange({ ...area, spots: moved(area.spots, index, -1) })}
                >
                  ↑
                </IconButton>
                <IconButton
                  size="xs"
                  variant="ghost"
                  aria-label={`Move ${name} back`}
                  onClick={() => onChange({ ...area, spots: moved(area.spots, index, 1) })}
                >
                  ↓
                </IconButton>
                <IconButton
                  size="xs"
                  variant="ghost"
                  colorPalette="nogo"
                  aria-label={`Remove ${name}`}
                  onClick={() => onChange({ ...area, spots: area.spots.filter((_, at) => at !== index) })}
                >
                  ×
                </IconButton>
              </HStack>
            </HStack>
            <PartProblems sentences={problems.get(`spot ${spot.name.trim()}`)} />
          </Stack>
        );
      })}
      <Button
        size="xs"
        variant="outline"
        alignSelf="start"
        onClick={() => onChange({ ...area, spots: [...area.spots, blankSpot(catapults)] })}
      >
        Add spot
      </Button>
    </Stack>
  );
}

/**
 * The admin's editor of the ship's deck: areas with their spots, the taxi times from each to each
 * catapult, and the elevators' trips. Saved whole; the server's sentences stand beside what they name.
 */
export function DeckLayoutEditor({ ship }: { ship: ShipView }) {
  const catapults = catapultNumbers(ship);
  const save = useSaveDeckLayout();
  const [draft, setDraft] = useState<DeckDraft>(() => toDeckDraft(ship));
  const [problem, setProblem] = useState<string | null>(null);
  const refusal = save.error instanceof ApiRequestError ? save.error : null;
  const problems = problemsByPart(refusal?.code === 'deck_layout_invalid' ? refusal.details : undefined);
  const setAreas = (areas: DraftArea[]) => setDraft((current) => ({ ...current, areas }));
  const setElevator = (index: number, change: Partial<DeckDraft['elevators'][number]>) =>
    setDraft((current) => ({
      ...current,
      elevators: current.elevators.map((elevator, at) => (at === index ? { ...elevator, ...change } : elevator)),
    }));

  const submit = () => {
    const result = toDeckLayoutRequest(draft, ship);
    if ('problem' in result) {
      setProblem(result.problem);
      return;
    }
    setProblem(null);
    save.mutate({ shipId: ship.id, layout: result.request });
  };

  return (
    <Stack gap="3" maxW="60rem">
      <Text color="fg.muted" fontSize="sm">
        Spots are listed front to back in their row; “clear before” names the spots in front that must be empty before
        an aircraft on it can taxi out.
      </Text>
      {(problem || save.isError) && (
        <Alert.Root status="error" colorPalette="nogo" role="alert">
          <Alert.Indicator />
          <Alert.Title>
            {problem ??
              (refusal?.code === 'deck_layout_invalid'
                ? 'The deck layout was not saved: fix the lines marked below.'
                : errorMessage(save.error))}
          </Alert.Title>
        </Alert.Root>
      )}
      <PartProblems sentences={problems.get('landing area')} />
      {draft.areas.map((area, index) => (
        <AreaPanel
          key={index}
          area={area}
          catapults={catapults}
          problems={problems}
          onChange={(changed) => setAreas(draft.areas.map((other, at) => (at === index ? changed : other)))}
          onRemove={() => setAreas(draft.areas.filter((_, at) => at !== index))}
        />
      ))}
      <Button
        size="sm"
        variant="outline"
        alignSelf="start"
        onClick={() => setAreas([...draft.areas, blankArea(catapults)])}
      >
        Add deck area
      </Button>
      <Stack as="section" aria-label="Elevators" gap="2" borderWidth="1px" rounded="card" p="3" bg="bg.panel">
        <Text fontWeight="700">Elevators</Text>
        <CatapultHeaders catapults={catapults} first="Elevator · one trip between hangar and flight deck (s)" />
        {draft.elevators.map((elevator, index) => {
          const name = elevator.name || `elevator ${index + 1}`;
          return (
            <Stack key={index} gap="1">
              <HStack gap="2">
                <HStack flex="1" gap="1">
                  <Input
                    size="sm"
                    aria-label={`Name of ${name}`}
                    value={elevator.name}
                    onChange={(event) => setElevator(index, { name: event.currentTarget.value })}
                  />
                  <Input
                    size="sm"
                    w="5rem"
                    inputMode="numeric"
                    aria-label={`Trip time of ${name}, seconds`}
                    value={elevator.cycleS}
                    onChange={(event) => setElevator(index, { cycleS: event.currentTarget.value })}
                  />
                </HStack>
                <TaxiInputs
                  taxi={elevator.taxi}
                  catapults={catapults}
                  what={`Taxi from ${name}`}
                  onChange={(taxi) => setElevator(index, { taxi })}
                />
                <Box w="7.5rem" />
              </HStack>
              <PartProblems sentences={problems.get(`elevator ${elevator.name.trim()}`)} />
            </Stack>
          );
        })}
        {ship.deckLayout.hangarBays.length > 0 && (
          <Text fontSize="sm" color="fg.muted">
            Hangar bays:{' '}
            {ship.deckLayout.hangarBays.map((bay) => `${bay.name} (by ${bay.elevators.join(', ')})`).join('; ')}
          </Text>
        )}
        <PartProblems
          sentences={[...problems.entries()]
            .filter(([part]) => part.startsWith('hangar bay '))
            .flatMap(([, sentences]) => sentences)}
        />
      </Stack>
      <HStack gap="2">
        <Button size="sm" colorPalette="accent" onClick={submit} loading={save.isPending}>
          Save deck layout
        </Button>
        {save.isSuccess && (
          <Text fontSize="sm" color="go.fg" role="status">
            Saved.
          </Text>
        )}
      </HStack>
    </Stack>
  );
}
