import { Badge } from '@chakra-ui/react';

export function GoBadge({ go, size = 'sm' }: { go: boolean; size?: 'sm' | 'md' | 'lg' }) {
  return (
    <Badge size={size} colorPalette={go ? 'go' : 'nogo'} variant="solid" fontWeight="700">
      {go ? 'GO' : 'NO-GO'}
    </Badge>
  );
}
