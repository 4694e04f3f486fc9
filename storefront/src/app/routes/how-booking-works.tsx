import { Box, Button, Container, Flex, Heading, Stack, Text } from '@chakra-ui/react';
import { Link as RouterLink } from 'react-router';
import { PageTitle } from '../../components/ui/page-title';
import { paths } from '../../config/paths';
import { useMe } from '../../features/auth/api/get-me';

const STEPS = [
  {
    title: 'Choose a menu',
    text: [
      'Each menu lists its desserts, the price per guest, the smallest and largest party it serves, and how many days ahead it must be booked.',
      'That notice is real kitchen time: some components rest in the cold for a day before they are churned, others set in the freezer overnight before they are cut.',
    ],
  },
  {
    title: 'Tell us the date and your guests',
    text: [
      'Give the date, the service time, the venue and the number of guests. Then add each guest’s allergies and diets — a first name or a label such as “Table 3, seat 2” is enough.',
      'We ask only for what the kitchen needs, and you confirm that your guests agreed to share it. Only you, the chef and the team serving your event can see it.',
    ],
  },
  {
    title: 'Pay a deposit',
    text: [
      'Before you pay you see the full price, the deposit, and the date the balance is due. The deposit holds your date while the chef reviews your event.',
    ],
  },
  {
    title: 'The chef confirms',
    text: [
      'The chef checks how many plates the kitchen can make that day and reads every guest’s requirements, then confirms. You receive a receipt and your event appears in My events.',
      'If the chef cannot take your event, the deposit is refunded in full.',
    ],
  },
] as const;

export function HowBookingWorksRoute() {
  const me = useMe();
  return (
    <>
      <PageTitle>How booking works</PageTitle>
      <Container maxW="3xl" py={{ base: '10', md: '16' }}>
        <Stack gap="4">
          <Heading as="h1" fontSize={{ base: '4xl', md: '5xl' }} fontWeight="normal">
            How booking works
          </Heading>
          <Text textStyle="lg" color="fg.muted">
            Booking a plated dessert takes a few minutes; making one takes days. Here is what
            happens in between.
          </Text>
        </Stack>

        <Flex gap="3" wrap="wrap" mt="8">
          <Button asChild colorPalette="accent">
            <RouterLink to={paths.menus.getHref()}>See the menus</RouterLink>
          </Button>
          <Button asChild variant="outline">
            <RouterLink to={paths.dates.getHref()}>See open dates</RouterLink>
          </Button>
        </Flex>

        <Box as="ol" listStyleType="none" mt="10">
          {STEPS.map((step, index) => (
            <Flex as="li" key={step.title} gap={{ base: '4', md: '6' }} pb="8">
              <Flex direction="column" align="center">
                <Flex
                  boxSize="10"
                  borderRadius="full"
                  bg="bg.inverted"
                  color="fg.inverted"
                  align="center"
                  justify="center"
                  fontFamily="heading"
                  fontWeight="bold"
                  fontSize="lg"
                  flexShrink="0"
                  aria-hidden
                >
                  {index + 1}
                </Flex>
                {index < STEPS.length - 1 && <Box flex="1" w="1px" bg="border.emphasized" mt="2" />}
              </Flex>
              <Stack gap="2" pt="1">
                <Heading as="h2" size="xl">
                  <Box as="span" srOnly>
                    Step {index + 1}:{' '}
                  </Box>
                  {step.title}
                </Heading>
                {step.text.map((paragraph) => (
                  <Text key={paragraph} color="fg.muted">
                    {paragraph}
                  </Text>
                ))}
              </Stack>
            </Flex>
          ))}
        </Box>

        <Stack gap="3" borderTopWidth="1px" borderColor="border" pt="8">
          <Heading as="h2" size="xl">
            If your plans change
          </Heading>
          <Text color="fg.muted">
            You can cancel from My events. How much comes back depends on how close to the event you
            cancel: the earlier you tell us, the more is refunded, because nearer the date the
            ingredients are bought and the components are already in production. The exact terms are
            shown before you pay and printed on your receipt.
          </Text>
        </Stack>

        <Stack gap="3" mt="8">
          <Heading as="h2" size="xl">
            Allergies and diets
          </Heading>
          <Text color="fg.muted">
            Tell us about every allergy, even a mild one. For each guest the kitchen sees which
            component of each dessert is affected, and changes or leaves it out for that guest. Our
            kitchen handles all the major allergens, so where a trace cannot be ruled out we say so;
            if an allergy is severe, talk to us before you book.
          </Text>
        </Stack>

        <Flex gap="3" wrap="wrap" mt="10">
          <Button asChild size="lg" colorPalette="accent">
            <RouterLink to={paths.menus.getHref()}>Choose a menu</RouterLink>
          </Button>
          {me.data ? (
            <Button asChild size="lg" variant="outline">
              <RouterLink to={paths.myEvents.getHref()}>Go to My events</RouterLink>
            </Button>
          ) : (
            <>
              <Button asChild size="lg" variant="outline">
                <RouterLink to={paths.createAccount.getHref()}>Create account</RouterLink>
              </Button>
              <Button asChild size="lg" variant="ghost">
                <RouterLink to={paths.signIn.getHref()}>Sign in</RouterLink>
              </Button>
            </>
          )}
        </Flex>
      </Container>
    </>
  );
}
