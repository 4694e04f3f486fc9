import { Box, Button, Flex, HStack, Stack, Text, VisuallyHidden } from '@chakra-ui/react';
import { plural, type OrderSummary } from '@nappe/shared';
import { Link as RouterLink } from 'react-router';
import { AllergyIcon, GuestsIcon } from '../../../components/ui/icons';
import { paths } from '../../../config/paths';
import { shortDate } from '../lib/format';

/**
 * Confirmed events, each with its service time, client, menu and guests, and the way to its
 * allergy briefing (which guest gets which change). No money: staff read this too.
 */
export function EventList({
  events,
  showDate,
  label,
}: {
  events: readonly OrderSummary[];
  showDate?: boolean;
  label: string;
}) {
  return (
    <Stack as="ul" gap="3" aria-label={label} ps="0" m="0">
      {events.map((e) => (
        <Box
          as="li"
          key={e.id}
          listStyleType="none"
          borderWidth="1px"
          borderColor="border"
          borderRadius="l3"
          bg="bg.panel"
          p={{ base: '3', md: '4' }}
        >
          <Flex
            gap="3"
            justify="space-between"
            align={{ base: 'stretch', sm: 'center' }}
            direction={{ base: 'column', sm: 'row' }}
          >
            <Stack gap="0.5" minW="0">
              <HStack gap="2" wrap="wrap">
                <Text fontWeight="semibold" textStyle="lg" fontVariantNumeric="tabular-nums">
                  {showDate ? `${shortDate(e.eventDate)} ` : ''}
                  {e.serviceTime}
                </Text>
                <Text fontWeight="semibold">{e.clientName}</Text>
                <Text color="fg.muted" textStyle="sm">
                  {e.reference}
                </Text>
              </HStack>
              <HStack gap="3" color="fg.muted" textStyle="sm" wrap="wrap">
                <Text>{e.menuName}</Text>
                <HStack gap="1">
                  <GuestsIcon aria-hidden boxSize="4" />
                  <Text>{plural(e.guestCount, 'guest')}</Text>
                </HStack>
              </HStack>
            </Stack>
            <Button asChild variant="outline" size="sm" flexShrink="0">
              <RouterLink to={paths.briefing.getHref(e.id)}>
                <AllergyIcon /> Allergy briefing
                <VisuallyHidden>
                  {' '}
                  for {e.reference}, {e.clientName}
                </VisuallyHidden>
              </RouterLink>
            </Button>
          </Flex>
        </Box>
      ))}
    </Stack>
  );
}
