import { IconButton, Menu } from '@chakra-ui/react';
import type { SlotView } from '@catline/contracts';
import { MoreIcon } from '../../../components/icons.js';
import type { SlotAction } from '../slot-actions.js';

/** Actions behind one button, so a busy board shows aircraft and catapults rather than buttons. */
export function ActionMenu({ label, actions, testId }: { label: string; actions: SlotAction[]; testId: string }) {
  if (actions.length === 0) return null;
  return (
    // Rendered beside its button (no portal), so the open menu stays inside the page's main landmark;
    // fixed positioning keeps it clear of the deck pool strip's scrolling.
    <Menu.Root
      positioning={{ placement: 'bottom-end', strategy: 'fixed' }}
      onSelect={({ value }) => actions.find((action) => action.id === value)?.run()}
    >
      <Menu.Trigger asChild>
        <IconButton aria-label={label} variant="ghost" size="sm" minW="tap" h="tap" flexShrink={0} data-testid={testId}>
          <MoreIcon />
        </IconButton>
      </Menu.Trigger>
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
    </Menu.Root>
  );
}

/** A slot card's menu. */
export const SlotMenu = ({ slot, actions }: { slot: SlotView; actions: SlotAction[] }) => (
  <ActionMenu label={`Actions for ${slot.sideNumber}`} actions={actions} testId="slot-menu" />
);
