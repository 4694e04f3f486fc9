import { createIcon, HStack, Text } from '@chakra-ui/react';
import { iconStroke as stroke } from '@nappe/web-kit';

/** A spoon coated with a drop of custard: the "nappe" that names the product. */
export const SpoonIcon = /* @__PURE__ */ createIcon({
  displayName: 'SpoonIcon',
  path: [
    <ellipse key="a" {...stroke} cx="9" cy="8.5" rx="5" ry="6" transform="rotate(-35 9 8.5)" />,
    <path key="b" {...stroke} d="M12.5 13l7.5 8" />,
    <path
      key="c"
      fill="currentColor"
      d="M5.4 6.2c1.6-2.3 4.6-2.8 6.4-1.2-.4 1.3-1.2 1.9-1.6 1.1-.7 1.7-1.6 1.6-1.8.6-.9 1.5-1.9 1-1.9-.1-.5.6-1.2.4-1.1-.4Z"
    />,
  ],
});

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
