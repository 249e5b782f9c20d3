import { IconButton, Menu, Portal } from '@chakra-ui/react';
import type { SlotView } from '@catline/contracts';
import { MoreIcon } from '../../../components/icons.js';
import type { SlotAction } from '../slot-actions.js';

/** A slot card's actions behind one button, so a busy lane shows aircraft rather than buttons. */
export function SlotMenu({ slot, actions }: { slot: SlotView; actions: SlotAction[] }) {
  if (actions.length === 0) return null;
  return (
    <Menu.Root
      positioning={{ placement: 'bottom-end' }}
      onSelect={({ value }) => actions.find((action) => action.id === value)?.run()}
    >
      <Menu.Trigger asChild>
        <IconButton
          aria-label={`Actions for ${slot.sideNumber}`}
          variant="ghost"
          size="sm"
          minW="tap"
          h="tap"
          flexShrink={0}
          data-testid="slot-menu"
        >
          <MoreIcon />
        </IconButton>
      </Menu.Trigger>
      <Portal>
        <Menu.Positioner>
          <Menu.Content minW="12rem">
            {actions.map((action) => (
              <Menu.Item
                key={action.id}
                value={action.id}
                minH="tap"
                fontSize="md"
                color={action.tone === 'danger' ? 'nogo.fg' : undefined}
                data-action={action.id}
              >
                {action.label}
              </Menu.Item>
            ))}
          </Menu.Content>
        </Menu.Positioner>
      </Portal>
    </Menu.Root>
  );
}
