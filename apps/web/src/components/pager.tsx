import { Button, HStack, Text } from '@chakra-ui/react';
import { nextPageOffset, type Page } from '@catline/contracts';

interface PagerProps {
  page: Page<unknown>;
  onOffset: (offset: number) => void;
  /** The buttons' words, in the list's own order (e.g. Newer / Older). */
  labels?: { previous: string; next: string };
}

/** Which rows of a paged list are on screen, with the buttons to the pages before and after. */
export function Pager({ page, onOffset, labels = { previous: 'Previous', next: 'Next' } }: PagerProps) {
  const next = nextPageOffset(page);
  return (
    <HStack gap="3">
      <Button
        size="sm"
        variant="outline"
        disabled={page.offset === 0}
        onClick={() => onOffset(Math.max(0, page.offset - page.limit))}
      >
        {labels.previous}
      </Button>
      <Text fontSize="sm" textStyle="figure">
        {page.items.length === 0 ? 0 : page.offset + 1}–{page.offset + page.items.length} of {page.total}
      </Text>
      <Button size="sm" variant="outline" disabled={next === null} onClick={() => next !== null && onOffset(next)}>
        {labels.next}
      </Button>
    </HStack>
  );
}
