import type { ReactNode } from 'react';
import { Button, CloseButton, Dialog, Portal, Text } from '@chakra-ui/react';
import { useFiguresLive } from './live-figures.js';

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
  // A dialog opens outside the live figures' disabled controls: its confirm waits for a live screen itself.
  const live = useFiguresLive();
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
              {!live && (
                <Text fontSize="sm" color="fg.muted" me="auto" role="status">
                  Not live: this waits until the screen has caught up.
                </Text>
              )}
              <Button variant="outline" onClick={onClose}>
                Cancel
              </Button>
              <Button colorPalette={tone} onClick={onConfirm} disabled={confirmDisabled || !live} loading={pending}>
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
