import type { ReactNode } from 'react';
import { Button, CloseButton, Dialog, Portal } from '@chakra-ui/react';

interface ActionDialogProps {
  open: boolean;
  title: string;
  onClose: () => void;
  children: ReactNode;
  confirmLabel: string;
  onConfirm: () => void;
  confirmDisabled?: boolean;
  pending?: boolean;
  tone?: 'accent' | 'nogo';
  size?: 'md' | 'lg' | 'xl';
}

/** A question before a change that others will see at once. */
export function ActionDialog({
  open,
  title,
  onClose,
  children,
  confirmLabel,
  onConfirm,
  confirmDisabled,
  pending,
  tone = 'accent',
  size = 'md',
}: ActionDialogProps) {
  return (
    <Dialog.Root
      open={open}
      onOpenChange={(details) => !details.open && onClose()}
      placement="center"
      size={{ base: 'full', md: size }}
      scrollBehavior="inside"
    >
      <Portal>
        <Dialog.Backdrop />
        <Dialog.Positioner>
          <Dialog.Content>
            <Dialog.Header>
              <Dialog.Title>{title}</Dialog.Title>
            </Dialog.Header>
            <Dialog.Body>{children}</Dialog.Body>
            <Dialog.Footer>
              <Button variant="outline" onClick={onClose}>
                Cancel
              </Button>
              <Button colorPalette={tone} onClick={onConfirm} disabled={confirmDisabled} loading={pending}>
                {confirmLabel}
              </Button>
            </Dialog.Footer>
            <Dialog.CloseTrigger asChild>
              <CloseButton size="sm" aria-label="Close" />
            </Dialog.CloseTrigger>
          </Dialog.Content>
        </Dialog.Positioner>
      </Portal>
    </Dialog.Root>
  );
}
