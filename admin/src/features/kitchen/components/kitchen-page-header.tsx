import { Flex, Heading, HStack, Stack, Text } from '@chakra-ui/react';
import type { ReactNode } from 'react';

/** The top of every Kitchen screen: the section, the title, a line of context, the actions. */
export function KitchenPageHeader({
  eyebrow = 'Kitchen',
  title,
  description,
  actions,
}: {
  eyebrow?: ReactNode;
  title: string;
  description?: ReactNode;
  actions?: ReactNode;
}) {
  return (
    <Flex
      direction={{ base: 'column', md: 'row' }}
      justify="space-between"
      align={{ base: 'stretch', md: 'end' }}
      gap="4"
      mb={{ base: '6', md: '8' }}
    >
      <Stack gap="2" minW="0">
        <Text color="caramel.fg" fontWeight="semibold" textStyle="sm">
          {eyebrow}
        </Text>
        <Heading
          as="h1"
          fontSize={{ base: '3xl', md: '4xl' }}
          fontWeight="normal"
          overflowWrap="anywhere"
        >
          {title}
        </Heading>
        {description && (
          <Text color="fg.muted" maxW="2xl">
            {description}
          </Text>
        )}
      </Stack>
      {actions && (
        <HStack gap="2" wrap="wrap" flexShrink="0">
          {actions}
        </HStack>
      )}
    </Flex>
  );
}
