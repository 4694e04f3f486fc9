import {
  Alert,
  Box,
  Button,
  ButtonGroup,
  Card,
  Container,
  Flex,
  Heading,
  IconButton,
  Pagination,
  Skeleton,
  Stack,
  Text,
} from '@chakra-ui/react';
import { Role } from '@nappe/shared';
import type { QueryClient } from '@tanstack/react-query';
import { useState, type ReactNode } from 'react';
import { Link as RouterLink, useSearchParams, type LoaderFunctionArgs } from 'react-router';
import { EmptyState } from '../../components/ui/empty-state';
import { ChevronLeftIcon, ChevronRightIcon, GuestsIcon } from '../../components/ui/icons';
import { LoadError } from '../../components/ui/load-error';
import { PageTitle } from '../../components/ui/page-title';
import { paths } from '../../config/paths';
import { meQueryOptions, useMe } from '../../features/auth/api/get-me';
import { RequireRole } from '../../features/auth/components/require-role';
import { useStudio } from '../../features/studio/api/get-studio';
import { USERS_PAGE_SIZE, usersQueryOptions, useUsers } from '../../features/users/api/get-users';
import { invitationsQueryOptions, useInvitations } from '../../features/users/api/invitations';
import { InvitationsList } from '../../features/users/components/invitations-list';
import { InviteForm } from '../../features/users/components/invite-form';
import { MemberActions } from '../../features/users/components/member-actions';
import { UsersTable, UsersTableSkeleton } from '../../features/users/components/users-table';

function pageFrom(value: string | null): number {
  const page = Number(value);
  return Number.isInteger(page) && page >= 1 ? page : 1;
}

/** Starts fetching the list while the screen's code arrives — for the chef only. */
export const teamLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const user = await queryClient.ensureQueryData(meQueryOptions());
    if (user?.role === Role.Chef) {
      const page = pageFrom(new URL(request.url).searchParams.get('page'));
      void queryClient.prefetchQuery(usersQueryOptions({ page, pageSize: USERS_PAGE_SIZE }));
      void queryClient.prefetchQuery(invitationsQueryOptions());
    }
    return null;
  };

export function TeamRoute() {
  const me = useMe();
  if (!me.data) return null; // The layout renders only for a signed-in team member.
  return (
    <RequireRole user={me.data} roles={[Role.Chef]}>
      <Team currentUserId={me.data.id} />
    </RequireRole>
  );
}

function Section({
  id,
  title,
  description,
  children,
}: {
  id: string;
  title: string;
  description?: ReactNode;
  children: ReactNode;
}) {
  return (
    <Box as="section" aria-labelledby={`${id}-title`}>
      <Stack gap="1" mb="4">
        <Heading as="h2" id={`${id}-title`} fontSize="2xl" fontWeight="normal">
          {title}
        </Heading>
        {description && (
          <Text color="fg.muted" maxW="2xl">
            {description}
          </Text>
        )}
      </Stack>
      {children}
    </Box>
  );
}

function PendingInvitations({ timeZone }: { timeZone?: string }) {
  const invitations = useInvitations();
  if (invitations.isPending) {
    return (
      <Box role="status">
        <Text srOnly>Loading invitations…</Text>
        <Skeleton height="16" />
      </Box>
    );
  }
  if (invitations.isError) {
    return (
      <LoadError
        title="The pending invitations could not be loaded"
        onRetry={() => void invitations.refetch()}
        retrying={invitations.isFetching}
      />
    );
  }
  return <InvitationsList invitations={invitations.data} timeZone={timeZone} />;
}

function Team({ currentUserId }: { currentUserId: string }) {
  const [memberMessage, setMemberMessage] = useState<string | null>(null);
  const [searchParams, setSearchParams] = useSearchParams();
  const page = pageFrom(searchParams.get('page'));
  const users = useUsers({ page, pageSize: USERS_PAGE_SIZE });
  const studio = useStudio();

  const goTo = (next: number) =>
    setSearchParams(next > 1 ? { page: String(next) } : {}, { preventScrollReset: true });

  return (
    <>
      <PageTitle>Team</PageTitle>
      <Container maxW="5xl" py={{ base: '6', md: '10' }}>
        <Stack gap="2" mb="6">
          <Text color="caramel.fg" fontWeight="semibold" textStyle="sm">
            Studio
          </Text>
          <Heading as="h1" fontSize={{ base: '3xl', md: '4xl' }} fontWeight="normal">
            Team and client accounts
          </Heading>
          <Text color="fg.muted" maxW="2xl">
            Invite the people who work with you, choose what they can do, and see everyone with an
            account: the team who use this kitchen app and the clients who book on the storefront.
          </Text>
        </Stack>

        <Stack gap={{ base: '8', md: '10' }}>
          <Section
            id="invite"
            title="Invite a team member"
            description="They get an e-mail with a link to choose their password. The link works once, for 7 days."
          >
            <Card.Root variant="outline" bg="bg.panel" borderColor="border">
              <Card.Body p={{ base: '4', md: '6' }}>
                <InviteForm />
              </Card.Body>
            </Card.Root>
          </Section>

          <Section id="pending" title="Pending invitations">
            <PendingInvitations timeZone={studio.data?.timeZone} />
          </Section>

          <Section
            id="accounts"
            title="Accounts"
            description="A change of role or a removal applies on the member’s next request. Your own account can be changed or removed only by another chef."
          >
            <Box aria-live="polite" aria-atomic="true" mb={memberMessage ? '4' : '0'}>
              {memberMessage && (
                <Alert.Root status="success" borderRadius="l2">
                  <Alert.Indicator />
                  <Alert.Content>
                    <Alert.Title>{memberMessage}</Alert.Title>
                  </Alert.Content>
                </Alert.Root>
              )}
            </Box>
            {users.isPending ? (
              <UsersTableSkeleton withActions />
            ) : users.isError ? (
              <LoadError
                title="The list of accounts could not be loaded"
                error={users.error}
                onRetry={() => void users.refetch()}
                retrying={users.isFetching}
              />
            ) : users.data.total === 0 ? (
              <EmptyState icon={<GuestsIcon />} title="No accounts yet">
                Team members and clients will be listed here once they have accounts.
              </EmptyState>
            ) : users.data.items.length === 0 ? (
              <Stack gap="3" align="start">
                <Text>This page is past the end of the list.</Text>
                <Button asChild variant="outline" size="sm">
                  <RouterLink to={paths.team.getHref()}>Back to the first page</RouterLink>
                </Button>
              </Stack>
            ) : (
              <Stack gap="4" opacity={users.isPlaceholderData ? 0.6 : 1} transition="opacity 0.2s">
                <UsersTable
                  users={users.data.items}
                  timeZone={studio.data?.timeZone}
                  renderActions={(user) => (
                    <MemberActions
                      user={user}
                      currentUserId={currentUserId}
                      onDone={setMemberMessage}
                    />
                  )}
                />
                <Flex
                  direction={{ base: 'column', sm: 'row' }}
                  justify="space-between"
                  align={{ base: 'start', sm: 'center' }}
                  gap="3"
                >
                  <Text color="fg.muted" textStyle="sm" aria-live="polite">
                    {rangeText(
                      users.data.page,
                      users.data.pageSize,
                      users.data.items.length,
                      users.data.total,
                    )}
                  </Text>
                  {users.data.total > users.data.pageSize && (
                    <Pagination.Root
                      count={users.data.total}
                      pageSize={users.data.pageSize}
                      page={page}
                      onPageChange={(details) => goTo(details.page)}
                    >
                      <ButtonGroup variant="ghost" size="sm" attached={false}>
                        <Pagination.PrevTrigger asChild>
                          <IconButton aria-label="Previous page">
                            <ChevronLeftIcon />
                          </IconButton>
                        </Pagination.PrevTrigger>
                        <Pagination.Items
                          render={(item) => (
                            <IconButton variant={{ base: 'ghost', _selected: 'outline' }}>
                              {item.value}
                            </IconButton>
                          )}
                        />
                        <Pagination.NextTrigger asChild>
                          <IconButton aria-label="Next page">
                            <ChevronRightIcon />
                          </IconButton>
                        </Pagination.NextTrigger>
                      </ButtonGroup>
                    </Pagination.Root>
                  )}
                </Flex>
              </Stack>
            )}
          </Section>
        </Stack>
      </Container>
    </>
  );
}

function rangeText(page: number, pageSize: number, shown: number, total: number): string {
  const first = (page - 1) * pageSize + 1;
  const last = first + shown - 1;
  return `Showing ${first}–${last} of ${total} ${total === 1 ? 'account' : 'accounts'}`;
}
