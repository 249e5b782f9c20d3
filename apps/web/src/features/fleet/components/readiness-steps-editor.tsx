import { type ReactNode, useState } from 'react';
import { Button, Fieldset, HStack, Stack, Text } from '@chakra-ui/react';
import { READINESS_STEPS, type CatapultView, type ReadinessStep, type ShipView } from '@catline/contracts';
import { CheckField } from '../../../components/check-field.js';
import { errorMessage } from '../../../lib/api-error.js';
import { STEP_LABELS } from '../../../lib/readiness-step-labels.js';
import { useUpdateCatapultSteps } from '../api/update-catapult-steps.js';
import { useUpdateShipSteps } from '../api/update-ship-steps.js';

/** The list with `step` ticked or not, still in the trade's order. */
const withStep = (steps: readonly ReadinessStep[], step: ReadinessStep, on: boolean) =>
  READINESS_STEPS.filter((candidate) => (candidate === step ? on : steps.includes(candidate)));

interface StepsFieldProps {
  legend: string;
  steps: readonly ReadinessStep[];
  onChange?: (steps: ReadinessStep[]) => void;
  /** The server's refusal, shown beside the list it refused. */
  error: string | null;
  children?: ReactNode;
}

/** One list of steps as ticks in the trade's order; the server judges what may be left out. */
function StepsField({ legend, steps, onChange, error, children }: StepsFieldProps) {
  return (
    <Fieldset.Root invalid={error !== null} borderWidth="1px" rounded="card" p="3" bg="bg.panel">
      <Fieldset.Legend fontWeight="700">{legend}</Fieldset.Legend>
      <Fieldset.Content gap="1">
        {children}
        {READINESS_STEPS.map((step) => (
          <CheckField
            key={step}
            label={STEP_LABELS[step]}
            checked={steps.includes(step)}
            disabled={!onChange}
            onChange={(on) => onChange?.(withStep(steps, step, on))}
          />
        ))}
      </Fieldset.Content>
      {error && <Fieldset.ErrorText color="nogo.fg">{error}</Fieldset.ErrorText>}
    </Fieldset.Root>
  );
}

function SaveRow({
  label,
  pending,
  saved,
  onSave,
}: {
  label: string;
  pending: boolean;
  saved: boolean;
  onSave: () => void;
}) {
  return (
    <HStack gap="2">
      <Button size="sm" colorPalette="accent" onClick={onSave} loading={pending}>
        {label}
      </Button>
      {saved && (
        <Text fontSize="sm" color="go.fg" role="status">
          Saved.
        </Text>
      )}
    </HStack>
  );
}

function ShipSteps({ ship }: { ship: ShipView }) {
  const save = useUpdateShipSteps();
  const [steps, setSteps] = useState<ReadinessStep[]>(() => [...(ship.profile.readinessSteps ?? READINESS_STEPS)]);
  return (
    <Stack gap="2">
      <StepsField
        legend={`${ship.name} readiness steps`}
        steps={steps}
        onChange={setSteps}
        error={save.isError ? errorMessage(save.error) : null}
      />
      <SaveRow
        label="Save the ship's steps"
        pending={save.isPending}
        saved={save.isSuccess}
        onSave={() => save.mutate({ ship, readinessSteps: steps })}
      />
    </Stack>
  );
}

function CatapultSteps({ catapult, shipSteps }: { catapult: CatapultView; shipSteps: readonly ReadinessStep[] }) {
  const save = useUpdateCatapultSteps();
  const [own, setOwn] = useState(catapult.readinessSteps !== null);
  const [steps, setSteps] = useState<ReadinessStep[]>(() => [...(catapult.readinessSteps ?? shipSteps)]);
  const name = `Catapult ${catapult.number}`;
  return (
    <Stack gap="2">
      <StepsField
        legend={`${name} (${catapult.position}) readiness steps`}
        steps={own ? steps : shipSteps}
        onChange={own ? setSteps : undefined}
        error={save.isError ? errorMessage(save.error) : null}
      >
        <CheckField label="Runs the ship's steps" checked={!own} onChange={(follows) => setOwn(!follows)} />
      </StepsField>
      <SaveRow
        label={`Save ${name.toLowerCase()} steps`}
        pending={save.isPending}
        saved={save.isSuccess}
        onSave={() =>
          save.mutate({ shipId: catapult.shipId, catapultId: catapult.id, readinessSteps: own ? steps : null })
        }
      />
    </Stack>
  );
}

/**
 * The admin's lists of readiness steps: the ship's, and each catapult's where it differs (a waist
 * catapult, say). Each saves on its own; the server's refusal stands beside the list it refused.
 */
export function ReadinessStepsEditor({ ship }: { ship: ShipView }) {
  const shipSteps = ship.profile.readinessSteps ?? READINESS_STEPS;
  return (
    <Stack gap="4" maxW="40rem">
      <Text color="fg.muted" fontSize="sm">
        Steps keep the trade’s order: a list may leave steps out, not reorder them. A catapult runs the ship’s steps
        unless it is given its own.
      </Text>
      <ShipSteps ship={ship} />
      {ship.catapults.map((catapult) => (
        <CatapultSteps key={catapult.id} catapult={catapult} shipSteps={shipSteps} />
      ))}
    </Stack>
  );
}
