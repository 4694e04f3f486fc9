import {
  Alert,
  Box,
  Button,
  Card,
  Container,
  Flex,
  Heading,
  HStack,
  SimpleGrid,
  Stack,
  Text,
} from '@chakra-ui/react';
import type { ReactNode } from 'react';
import { Link as RouterLink, useLocation } from 'react-router';
import {
  ArrowRightIcon,
  CalendarIcon,
  CheckIcon,
  GuestsIcon,
  PlateIcon,
} from '../../components/ui/icons';
import { PageTitle } from '../../components/ui/page-title';
import { PlateIllustration } from '../../components/ui/plate-illustration';
import { Skeleton } from '../../components/ui/skeleton';
import { TextLink } from '../../components/ui/text-link';
import { paths } from '../../config/paths';
import { useMe } from '../../features/auth/api/get-me';
import { useMenus } from '../../features/menus/api/get-menus';
import { MenuCard } from '../../features/menus/components/menu-card';
import { MenuGridSkeleton } from '../../features/menus/components/menu-skeletons';
import { useStudio } from '../../features/studio/api/get-studio';
import { FEATURED_MENUS } from '../screen-loaders';
import type { AccountDeletedState } from './my-events';

const OCCASIONS = [
  {
    title: 'Dinner parties',
    text: 'A dessert course plated at your table, so the evening ends where it began and you can stay with your guests.',
  },
  {
    title: 'Weddings',
    text: 'A plated dessert for every guest, served on your timing, with each allergy and diet you tell us about handled guest by guest.',
  },
  {
    title: 'Company dinners',
    text: 'One price per guest agreed before the date, a deposit and a balance, and a receipt and invoice your accounts team can file.',
  },
  {
    title: 'Private tastings',
    text: 'A small table and several desserts, each plated in front of you with the story of its components.',
  },
] as const;

const STEPS = [
  {
    icon: PlateIcon,
    title: 'Choose a menu',
    text: 'Each menu shows its desserts, the price per guest and how many guests it serves.',
  },
  {
    icon: GuestsIcon,
    title: 'Tell us about your event',
    text: 'The date, the service time, the venue, and every guest’s allergies and diets.',
  },
  {
    icon: CalendarIcon,
    title: 'Pay a deposit; the chef confirms',
    text: 'Your date is held while the chef checks the kitchen’s day, then confirms your event.',
  },
] as const;

export function HomeRoute() {
  const studio = useStudio();
  const me = useMe();
  const signedIn = Boolean(me.data);

  const accountDeleted =
    (useLocation().state as Partial<AccountDeletedState> | null)?.accountDeleted === true;

  return (
    <>
      <PageTitle>Plated desserts for private events</PageTitle>
      {accountDeleted && (
        <Container maxW="6xl" pt="6">
          <Alert.Root status="success" role="status" borderRadius="l2">
            <Alert.Indicator />
            <Alert.Content>
              <Alert.Title>Your account is deleted</Alert.Title>
              <Alert.Description>
                Your name, e-mail, password and your guests’ details are erased, and you are signed
                out. The studio keeps your payment records without your name, as bookkeeping law
                requires.
              </Alert.Description>
            </Alert.Content>
          </Alert.Root>
        </Container>
      )}
      <Box
        as="section"
        aria-labelledby="hero-heading"
        bgGradient="to-b"
        gradientFrom="bg.subtle"
        gradientTo="bg"
      >
        <Container maxW="6xl" py={{ base: '10', md: '20' }}>
          <Flex
            direction={{ base: 'column', md: 'row' }}
            align="center"
            gap={{ base: '8', md: '12' }}
          >
            <Stack gap="6" flex="1.1" maxW="2xl">
              <Text
                textStyle="sm"
                fontWeight="semibold"
                letterSpacing="0.12em"
                textTransform="uppercase"
                color="caramel.fg"
              >
                {studio.data ? `${studio.data.name} · ${studio.data.city}` : 'A dessert studio'}
              </Text>
              <Heading
                as="h1"
                id="hero-heading"
                fontSize={{ base: '4xl', md: '6xl' }}
                lineHeight="1.05"
                fontWeight="normal"
              >
                Plated desserts for the evenings that matter
              </Heading>
              <Text textStyle={{ base: 'md', md: 'lg' }} color="fg.muted" maxW="xl">
                {studio.isPending ? (
                  // The chef's tagline is on its way: a placeholder about as long as a tagline,
                  // so that the sentence after it is already where it will stay.
                  <Skeleton
                    as="span"
                    display="inline-block"
                    verticalAlign="middle"
                    h="1em"
                    w="16em"
                    maxW="full"
                  />
                ) : (
                  withFullStop(
                    studio.data?.tagline ??
                      'A pastry studio that brings a finished, plated dessert to every guest at your dinner party, wedding, company dinner or private tasting',
                  )
                )}{' '}
                Every guest’s allergies reach the kitchen before anything is cooked.
              </Text>
              <HStack gap="3" wrap="wrap">
                <Button asChild size="lg" colorPalette="accent">
                  <RouterLink to={paths.menus.getHref()}>
                    See the menus <ArrowRightIcon />
                  </RouterLink>
                </Button>
                <Button asChild size="lg" variant="outline">
                  <RouterLink to={paths.howBookingWorks.getHref()}>How booking works</RouterLink>
                </Button>
              </HStack>
            </Stack>
            <Box flex="1" w="full" maxW={{ base: '20rem', md: '28rem' }}>
              <PlateIllustration w="full" h="auto" />
            </Box>
          </Flex>
        </Container>
      </Box>

      <FeaturedMenus />

      <Container
        as="section"
        aria-labelledby="occasions-heading"
        maxW="6xl"
        py={{ base: '12', md: '16' }}
      >
        <SectionHeading id="occasions-heading" eyebrow="What we plate for">
          Four kinds of table, one kitchen
        </SectionHeading>
        <SimpleGrid columns={{ base: 1, sm: 2, lg: 4 }} gap="5" mt="8">
          {OCCASIONS.map((occasion) => (
            <Card.Root key={occasion.title} variant="outline" bg="bg.panel" borderColor="border">
              <Card.Body gap="2">
                <Heading as="h3" size="lg">
                  {occasion.title}
                </Heading>
                <Text color="fg.muted" textStyle="sm">
                  {occasion.text}
                </Text>
              </Card.Body>
            </Card.Root>
          ))}
        </SimpleGrid>
      </Container>

      <Box as="section" aria-labelledby="steps-heading" bg="bg.muted">
        <Container maxW="6xl" py={{ base: '12', md: '16' }}>
          <SectionHeading id="steps-heading" eyebrow="How booking works">
            Three steps to dessert for everyone
          </SectionHeading>
          <SimpleGrid as="ol" columns={{ base: 1, md: 3 }} gap="8" mt="8" listStyleType="none">
            {STEPS.map((step, index) => (
              <Stack as="li" key={step.title} gap="3">
                <HStack gap="3">
                  <Flex
                    boxSize="10"
                    borderRadius="full"
                    bg="accent.subtle"
                    color="accent.fg"
                    align="center"
                    justify="center"
                    aria-hidden
                  >
                    <step.icon boxSize="5" />
                  </Flex>
                  <Text color="fg.muted" textStyle="sm" fontWeight="semibold">
                    Step {index + 1}
                  </Text>
                </HStack>
                <Heading as="h3" size="lg">
                  {step.title}
                </Heading>
                <Text color="fg.muted">{step.text}</Text>
              </Stack>
            ))}
          </SimpleGrid>
          <Text mt="8">
            <TextLink to={paths.howBookingWorks.getHref()}>
              Read what happens at each step, and how cancellation works
            </TextLink>
          </Text>
        </Container>
      </Box>

      <Container
        as="section"
        aria-labelledby="cta-heading"
        maxW="6xl"
        pt={{ base: '12', md: '16' }}
      >
        <Stack
          direction={{ base: 'column', md: 'row' }}
          align={{ base: 'start', md: 'center' }}
          justify="space-between"
          gap="6"
          bg="bg.inverted"
          color="fg.inverted"
          borderRadius="l3"
          px={{ base: '6', md: '10' }}
          py={{ base: '8', md: '10' }}
        >
          <Stack gap="2" maxW="2xl">
            <Heading as="h2" id="cta-heading" size="2xl" color="fg.inverted" fontWeight="normal">
              Planning an event?
            </Heading>
            <Text color="fg.inverted" opacity={0.85}>
              Choose a menu and an open date, tell us about your guests, and see the full price
              before you pay anything.
            </Text>
            <HStack gap="2" color="accent.muted" textStyle="sm">
              <CheckIcon boxSize="4" flexShrink="0" />
              <Text>A deposit holds your date; the balance is due shortly before the event.</Text>
            </HStack>
          </Stack>
          <HStack gap="3" wrap="wrap">
            <Button asChild size="lg" colorPalette="accent">
              <RouterLink to={paths.dates.getHref()}>See open dates</RouterLink>
            </Button>
            {signedIn ? (
              <Button
                asChild
                size="lg"
                variant="outline"
                color="fg.inverted"
                borderColor="fg.inverted"
                _hover={{ bg: 'whiteAlpha.200' }}
              >
                <RouterLink to={paths.myEvents.getHref()}>Go to My events</RouterLink>
              </Button>
            ) : (
              <Button
                asChild
                size="lg"
                variant="outline"
                color="fg.inverted"
                borderColor="fg.inverted"
                _hover={{ bg: 'whiteAlpha.200' }}
              >
                <RouterLink to={paths.createAccount.getHref()}>Create account</RouterLink>
              </Button>
            )}
          </HStack>
        </Stack>
      </Container>
    </>
  );
}

/** Up to three menus, photo first; the section stays out of the way if they cannot load. */
function FeaturedMenus() {
  const menus = useMenus(1, FEATURED_MENUS);
  if (menus.isError || (menus.data && menus.data.items.length === 0)) return null;
  return (
    <Container
      as="section"
      aria-labelledby="menus-heading"
      maxW="6xl"
      pt={{ base: '12', md: '16' }}
    >
      <HStack justify="space-between" align="end" gap="4" wrap="wrap">
        <SectionHeading id="menus-heading" eyebrow="This season">
          Menus to book
        </SectionHeading>
        <TextLink to={paths.menus.getHref()}>All menus</TextLink>
      </HStack>
      <Box mt="8">
        {menus.isPending ? (
          <MenuGridSkeleton />
        ) : (
          <SimpleGrid columns={{ base: 1, md: 2, lg: 3 }} gap="6">
            {menus.data.items.map((menu) => (
              <MenuCard key={menu.id} menu={menu} />
            ))}
          </SimpleGrid>
        )}
      </Box>
    </Container>
  );
}

function SectionHeading({
  id,
  eyebrow,
  children,
}: {
  id: string;
  eyebrow: string;
  children: ReactNode;
}) {
  return (
    <Stack gap="2">
      <Text
        textStyle="sm"
        fontWeight="semibold"
        letterSpacing="0.12em"
        textTransform="uppercase"
        color="caramel.fg"
      >
        {eyebrow}
      </Text>
      <Heading as="h2" id={id} fontSize={{ base: '3xl', md: '4xl' }} fontWeight="normal">
        {children}
      </Heading>
    </Stack>
  );
}

/** The studio's tagline is written by the chef, with or without a full stop; the sentence after it needs one. */
function withFullStop(text: string): string {
  const trimmed = text.trim();
  return /[.!?…]$/.test(trimmed) ? trimmed : `${trimmed}.`;
}
