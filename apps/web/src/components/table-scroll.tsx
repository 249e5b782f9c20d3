import { Table, type TableScrollAreaProps } from '@chakra-ui/react';
import { useFiguresLive } from './live-figures.js';

/**
 * A table's sideways scroll box, named and reachable by Tab: on a narrow screen the keyboard scrolls it too
 * (axe: scrollable-region-focusable). Its name says "table" so it never repeats the section it sits in.
 * Among figures that are not live it sits in their disabled fieldset, where axe counts it as out of the
 * keyboard's reach, so there it scrolls not at all: its cells wrap to fit, and what still does not spills over for the page itself
 * to scroll.
 */
export function TableScroll({ label, ...props }: TableScrollAreaProps & { label: string }) {
  const scrolls = useFiguresLive();
  return (
    <Table.ScrollArea
      tabIndex={scrolls ? 0 : undefined}
      overflow={scrolls ? undefined : 'visible'}
      whiteSpace={scrolls ? undefined : 'normal'}
      role="region"
      aria-label={`${label} (table)`}
      borderWidth="1px"
      rounded="card"
      {...props}
    />
  );
}
