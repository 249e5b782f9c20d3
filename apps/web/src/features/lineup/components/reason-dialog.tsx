import { useState } from 'react';
import { Input, Stack, Text } from '@chakra-ui/react';
import { CheckField } from '../../../components/check-field.js';
import { ActionDialog } from '../../../components/action-dialog.js';
import { CautionLine } from '../../../components/caution-line.js';
import { FormField } from '../../../components/form-field.js';

interface ReasonDialogProps {
  title: string;
  explanation: string;
  confirmLabel: string;
  placeholder: string;
  /** A box the sender ticks to say someone agreed (sent only when it is shown). */
  agreement?: string;
  /** The explanation states a launch figure, so the launch caution goes with it. */
  showsFigures?: boolean;
  pending: boolean;
  onClose: () => void;
  onConfirm: (reason: string, agreed: boolean | undefined) => void;
}

/** A change to one aircraft that needs a reason in the log: up again, back to the deck pool, a waiver. */
export function ReasonDialog({
  title,
  explanation,
  confirmLabel,
  placeholder,
  agreement,
  showsFigures = false,
  pending,
  onClose,
  onConfirm,
}: ReasonDialogProps) {
  const [reason, setReason] = useState('');
  const [agreed, setAgreed] = useState(false);
  const [touched, setTouched] = useState(false);
  const missingReason = reason.trim().length === 0;
  return (
    <ActionDialog
      open
      title={title}
      onClose={onClose}
      confirmLabel={confirmLabel}
      onConfirm={() => {
        setTouched(true);
        if (!missingReason) onConfirm(reason.trim(), agreement === undefined ? undefined : agreed);
      }}
      pending={pending}
      tone="accent"
    >
      <Stack gap="4">
        <Text>{explanation}</Text>
        <FormField label="Reason" required error={touched && missingReason ? 'Say why.' : undefined}>
          <Input
            value={reason}
            onChange={(event) => setReason(event.currentTarget.value)}
            placeholder={placeholder}
            maxLength={200}
          />
        </FormField>
        {agreement !== undefined && <CheckField label={agreement} checked={agreed} onChange={setAgreed} />}
        {showsFigures && <CautionLine compact />}
      </Stack>
    </ActionDialog>
  );
}
