import { Box, Skeleton, Table, Text, VisuallyHidden } from '@chakra-ui/react';
import type { ReactNode } from 'react';
import { RoleBadge } from '../../../components/ui/role-badge';
import type { UserListItem } from '../api/get-users';

function formatJoined(iso: string, timeZone?: string): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return '—';
  return new Intl.DateTimeFormat('en-GB', { dateStyle: 'medium', timeZone }).format(date);
}

const COLUMNS = ['Name', 'E-mail', 'Role', 'Joined', 'Actions'] as const;
/** On a phone the e-mail moves under the name and the date is left out. */
const HIDE_BELOW: Partial<Record<(typeof COLUMNS)[number], 'md'>> = {
  'E-mail': 'md',
  Joined: 'md',
};

function Frame({
  children,
  busy,
  withActions,
}: {
  children: ReactNode;
  busy?: boolean;
  withActions?: boolean;
}) {
  return (
    <Table.ScrollArea
      borderWidth="1px"
      borderColor="border"
      borderRadius="l3"
      bg="bg.panel"
      aria-busy={busy || undefined}
    >
      <Table.Root size="md" interactive={!busy && !withActions}>
        <Table.Caption srOnly>Accounts at the studio</Table.Caption>
        <Table.Header>
          <Table.Row bg="bg.muted">
            {COLUMNS.filter((c) => withActions || c !== 'Actions').map((column) => (
              <Table.ColumnHeader
                key={column}
                color="fg.muted"
                fontWeight="semibold"
                hideBelow={HIDE_BELOW[column]}
              >
                {column}
              </Table.ColumnHeader>
            ))}
          </Table.Row>
        </Table.Header>
        <Table.Body>{children}</Table.Body>
      </Table.Root>
    </Table.ScrollArea>
  );
}

export function UsersTable({
  users,
  timeZone,
  renderActions,
}: {
  users: UserListItem[];
  timeZone?: string;
  /** The last column's content for each account; without it the table has no actions column. */
  renderActions?: (user: UserListItem) => ReactNode;
}) {
  return (
    <Frame withActions={!!renderActions}>
      {users.map((user) => (
        <Table.Row key={user.id} bg="bg.panel">
          <Table.Cell>
            <Text fontWeight="medium">{user.name}</Text>
            <Text hideFrom="md" textStyle="sm" color="fg.muted" wordBreak="break-all">
              {user.email}
            </Text>
          </Table.Cell>
          <Table.Cell hideBelow="md">
            <Text as="span" wordBreak="break-all">
              {user.email}
            </Text>
          </Table.Cell>
          <Table.Cell>
            <RoleBadge role={user.role} />
          </Table.Cell>
          <Table.Cell hideBelow="md" whiteSpace="nowrap">
            {formatJoined(user.createdAt, timeZone)}
          </Table.Cell>
          {renderActions && <Table.Cell>{renderActions(user)}</Table.Cell>}
        </Table.Row>
      ))}
    </Frame>
  );
}

/** The table's shape while the first page loads. */
export function UsersTableSkeleton({
  rows = 6,
  withActions,
}: {
  rows?: number;
  withActions?: boolean;
}) {
  return (
    <Box role="status">
      <VisuallyHidden>Loading accounts…</VisuallyHidden>
      <Frame busy withActions={withActions}>
        {Array.from({ length: rows }, (_, row) => (
          <Table.Row key={row} bg="bg.panel">
            {COLUMNS.filter((c) => withActions || c !== 'Actions').map((column) => (
              <Table.Cell key={column} hideBelow={HIDE_BELOW[column]}>
                <Skeleton height="4" width={column === 'E-mail' ? '48' : '24'} />
              </Table.Cell>
            ))}
          </Table.Row>
        ))}
      </Frame>
    </Box>
  );
}
