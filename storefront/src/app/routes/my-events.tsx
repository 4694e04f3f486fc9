import { Button, Container, EmptyState, Heading, Stack, Text, VStack } from '@chakra-ui/react';
import { Link as RouterLink } from 'react-router';
import { CalendarIcon } from '../../components/ui/icons';
import { PageTitle } from '../../components/ui/page-title';
import { paths } from '../../config/paths';
import { RequireUser } from '../../features/auth/components/require-user';

export function MyEventsRoute() {
  return (
    <RequireUser>
      {(user) => (
        <>
          <PageTitle>My events</PageTitle>
          <Container maxW="4xl" py={{ base: '10', md: '16' }}>
            <Stack gap="2">
              <Heading as="h1" fontSize={{ base: '4xl', md: '5xl' }} fontWeight="normal">
                My events
              </Heading>
              <Text color="fg.muted">
                Signed in as {user.name} ({user.email})
              </Text>
            </Stack>
            <EmptyState.Root
              mt="10"
              borderWidth="1px"
              borderStyle="dashed"
              borderColor="border.emphasized"
              borderRadius="l3"
              bg="bg.panel"
            >
              <EmptyState.Content>
                <EmptyState.Indicator color="caramel.fg">
                  <CalendarIcon />
                </EmptyState.Indicator>
                <VStack textAlign="center" gap="2">
                  <EmptyState.Title fontFamily="heading" textStyle="2xl">
                    No events yet
                  </EmptyState.Title>
                  <EmptyState.Description color="fg.muted" maxW="md">
                    When you book a dessert for an event, it will appear here with its date, guests
                    and diets, payments and documents.
                  </EmptyState.Description>
                </VStack>
                <Button asChild variant="outline">
                  <RouterLink to={paths.howBookingWorks.getHref()}>
                    See how booking works
                  </RouterLink>
                </Button>
              </EmptyState.Content>
            </EmptyState.Root>
          </Container>
        </>
      )}
    </RequireUser>
  );
}
