import {
  Card,
  Container,
  Flex,
  Heading,
  HStack,
  SimpleGrid,
  Skeleton,
  Stack,
  Text,
} from '@chakra-ui/react';
import { Role, type AuthUser } from '@nappe/shared';
import { useState, type ComponentType } from 'react';
import { AllergyIcon, CalendarIcon, InboxIcon, WhiskIcon } from '../../components/ui/icons';
import { PageTitle } from '../../components/ui/page-title';
import { RoleBadge } from '../../components/ui/role-badge';
import { useMe } from '../../features/auth/api/get-me';
import { useStudio } from '../../features/studio/api/get-studio';
import { deviceTimeZone, formatStudioDate, greeting } from '../../lib/studio-time';

interface Panel {
  title: string;
  empty: string;
  detail: string;
  icon: ComponentType<{ boxSize?: string }>;
  roles: readonly Role[];
}

const PANELS: Panel[] = [
  {
    title: 'Requests awaiting you',
    empty: 'No booking requests are waiting.',
    detail:
      'When a client pays a deposit, the request waits here for you to confirm or decline, with the kitchen’s capacity for that day beside it.',
    icon: InboxIcon,
    roles: [Role.Chef],
  },
  {
    title: 'Services today',
    empty: 'No services today.',
    detail:
      'Each confirmed event for today will appear here with its service time, venue and number of guests.',
    icon: CalendarIcon,
    roles: [Role.Chef, Role.Staff],
  },
  {
    title: 'Prep due today',
    empty: 'Nothing to prep yet.',
    detail:
      'The steps due today — bases to mature, mousses to set, crumbles to bake — will be listed here, worked back from each service time.',
    icon: WhiskIcon,
    roles: [Role.Chef, Role.Staff],
  },
  {
    title: 'Allergy notes',
    empty: 'No allergy notes for today.',
    detail:
      'Every guest’s allergies and diets for today’s events will appear here, with the components to change or leave out.',
    icon: AllergyIcon,
    roles: [Role.Chef, Role.Staff],
  },
];

export function TodayRoute() {
  const me = useMe();
  const user = me.data;
  if (!user) return null; // The layout renders only for a signed-in team member.
  return <Today user={user} />;
}

function Today({ user }: { user: AuthUser }) {
  const studio = useStudio();
  const [now] = useState(() => new Date());
  const timeZone = studio.data?.timeZone ?? deviceTimeZone();
  const firstName = user.name.split(/\s+/)[0] ?? user.name;

  return (
    <>
      <PageTitle>Today</PageTitle>
      <Container maxW="5xl" py={{ base: '6', md: '10' }}>
        <Stack gap="2">
          {studio.isPending ? (
            <Skeleton height="5" width="64" />
          ) : (
            <Text color="caramel.fg" fontWeight="semibold" textStyle="sm">
              {formatStudioDate(now, timeZone)}
              <Text as="span" color="fg.muted" fontWeight="normal">
                {studio.data
                  ? ` · studio time (${studio.data.timeZone})`
                  : ` · your device’s time zone; the studio’s could not be loaded`}
              </Text>
            </Text>
          )}
          <Heading as="h1" fontSize={{ base: '3xl', md: '4xl' }} fontWeight="normal">
            {greeting(now, timeZone)}, {firstName}
          </Heading>
          <HStack gap="2">
            <Text color="fg.muted">Signed in as</Text>
            <RoleBadge role={user.role} />
            {studio.data && <Text color="fg.muted">at {studio.data.name}</Text>}
          </HStack>
        </Stack>

        <SimpleGrid columns={{ base: 1, md: 2 }} gap="5" mt="8">
          {PANELS.filter((panel) => panel.roles.includes(user.role)).map((panel) => (
            <Card.Root
              key={panel.title}
              variant="outline"
              bg="bg.panel"
              borderColor="border"
              as="section"
              aria-labelledby={`panel-${panel.title}`}
            >
              <Card.Body gap="3">
                <HStack gap="3">
                  <Flex
                    boxSize="9"
                    borderRadius="full"
                    bg="accent.subtle"
                    color="accent.fg"
                    align="center"
                    justify="center"
                    aria-hidden
                  >
                    <panel.icon boxSize="5" />
                  </Flex>
                  <Heading as="h2" size="lg" id={`panel-${panel.title}`}>
                    {panel.title}
                  </Heading>
                </HStack>
                <Text fontWeight="medium">{panel.empty}</Text>
                <Text color="fg.muted" textStyle="sm">
                  {panel.detail}
                </Text>
              </Card.Body>
            </Card.Root>
          ))}
        </SimpleGrid>
      </Container>
    </>
  );
}
