import { Box, chakra, Flex, Link, List, Text } from '@chakra-ui/react';
import { Link as RouterLink } from 'react-router';
import { CheckIcon } from '../../../components/ui/icons';
import { BOOKING_STEPS, paths, type BookingStep } from '../../../config/paths';

export const STEP_TITLES: Record<BookingStep | 'booked', string> = {
  event: 'Your event',
  guests: 'Your guests',
  review: 'Review',
  payment: 'Payment',
  booked: 'Booked',
};

const ALL_STEPS = [...BOOKING_STEPS, 'booked'] as const;

/**
 * Where the client is in the booking: the five steps in order, the current one marked for
 * screen readers (`aria-current="step"`), the ones already done as links back.
 */
export function StepIndicator({
  menuId,
  current,
  reachable,
}: {
  menuId: string;
  current: BookingStep;
  reachable: ReadonlySet<BookingStep>;
}) {
  const currentIndex = ALL_STEPS.indexOf(current);
  return (
    <Box as="nav" aria-label="Booking steps">
      <Text textStyle="sm" color="fg.muted" mb="2" display={{ base: 'block', md: 'none' }}>
        Step {currentIndex + 1} of {ALL_STEPS.length}: {STEP_TITLES[current]}
      </Text>
      <List.Root
        as="ol"
        listStyleType="none"
        display="flex"
        flexDirection="row"
        gap={{ base: '1.5', md: '2' }}
      >
        {ALL_STEPS.map((step, index) => {
          const done = index < currentIndex;
          const isCurrent = step === current;
          const canGo = step !== 'booked' && !isCurrent && reachable.has(step as BookingStep);
          const marker = (
            <Flex
              boxSize="7"
              flexShrink="0"
              borderRadius="full"
              align="center"
              justify="center"
              textStyle="sm"
              fontWeight="semibold"
              borderWidth="1px"
              borderColor={isCurrent ? 'fg' : done ? 'accent.border' : 'border.emphasized'}
              bg={isCurrent ? 'bg.inverted' : done ? 'accent.subtle' : 'transparent'}
              color={isCurrent ? 'fg.inverted' : done ? 'accent.fg' : 'fg.muted'}
              aria-hidden="true"
            >
              {done ? <CheckIcon boxSize="4" /> : index + 1}
            </Flex>
          );
          const label = (
            <chakra.span
              display={{ base: 'none', md: 'inline' }}
              fontWeight={isCurrent ? 'semibold' : 'normal'}
              color={isCurrent ? 'fg' : 'fg.muted'}
              textStyle="sm"
              whiteSpace="nowrap"
            >
              {STEP_TITLES[step]}
            </chakra.span>
          );
          const srLabel = (
            <chakra.span srOnly>
              {STEP_TITLES[step]}
              {done ? ' (done)' : ''}
            </chakra.span>
          );
          return (
            <List.Item
              key={step}
              flex={{ base: '0 0 auto', md: '1 1 0' }}
              display="flex"
              alignItems="center"
              gap="2"
              aria-current={isCurrent ? 'step' : undefined}
              _after={
                index < ALL_STEPS.length - 1
                  ? { content: '""', flex: '1', h: '1px', bg: 'border', minW: '2' }
                  : undefined
              }
            >
              {canGo ? (
                <Link
                  asChild
                  display="flex"
                  alignItems="center"
                  gap="2"
                  _hover={{ textDecoration: 'underline' }}
                >
                  <RouterLink to={paths.book.getHref(menuId, step as BookingStep)}>
                    {marker}
                    {label}
                    {srLabel}
                  </RouterLink>
                </Link>
              ) : (
                <Flex align="center" gap="2">
                  {marker}
                  {label}
                  {srLabel}
                </Flex>
              )}
            </List.Item>
          );
        })}
      </List.Root>
    </Box>
  );
}
