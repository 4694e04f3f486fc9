import { HStack, Text } from '@chakra-ui/react';
import { SpoonIcon } from './icons';

/** "Nappe" in Playfair Display beside the coated-spoon mark. */
export function Wordmark({ size = 'md' }: { size?: 'md' | 'lg' }) {
  return (
    <HStack gap="2" color="fg">
      <SpoonIcon boxSize={size === 'lg' ? '8' : '6'} color="caramel.fg" aria-hidden />
      <Text
        as="span"
        fontFamily="heading"
        fontWeight="bold"
        fontSize={size === 'lg' ? '3xl' : '2xl'}
        letterSpacing="-0.02em"
        lineHeight="1"
      >
        Nappe
      </Text>
    </HStack>
  );
}
