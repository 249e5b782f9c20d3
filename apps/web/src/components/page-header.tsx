import type { ReactNode } from 'react';
import { Flex, Heading, HStack, Text } from '@chakra-ui/react';

export function PageHeader({
  title,
  subtitle,
  children,
}: {
  title: string;
  subtitle?: ReactNode;
  children?: ReactNode;
}) {
  return (
    <Flex gap="3" wrap="wrap" align="center" justify="space-between">
      <HStack gap="3" align="baseline" wrap="wrap" minW="0">
        <Heading as="h1" size={{ base: 'xl', md: '2xl' }} fontWeight="700">
          {title}
        </Heading>
        {subtitle && (
          <Text color="fg.muted" fontSize="sm">
            {subtitle}
          </Text>
        )}
      </HStack>
      {children && (
        <HStack gap="2" wrap="wrap">
          {children}
        </HStack>
      )}
    </Flex>
  );
}
