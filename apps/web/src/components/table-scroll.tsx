import { Table, type TableScrollAreaProps } from '@chakra-ui/react';

/**
 * A table's sideways scroll box, named and reachable by Tab: on a narrow screen the keyboard scrolls it too
 * (axe: scrollable-region-focusable). Its name says "table" so it never repeats the section it sits in.
 */
export function TableScroll({ label, ...props }: TableScrollAreaProps & { label: string }) {
  return (
    <Table.ScrollArea
      tabIndex={0}
      role="region"
      aria-label={`${label} (table)`}
      borderWidth="1px"
      rounded="card"
      {...props}
    />
  );
}
