import { Box, Button, Flex, Stack, Text } from '@chakra-ui/react';
import { Role } from '@nappe/shared';
import { useState } from 'react';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { RoleBadge } from '../../../components/ui/role-badge';
import type { Invitation } from '../api/invitations';
import { useRevokeInvitation } from '../api/revoke-invitation';

const HOUR = 3_600_000;

/** "expires in 6 days (9 Dec 2026, 10:30)", in the studio's zone. */
export function describeExpiry(expiresAt: string, now: Date, timeZone?: string): string {
  const at = new Date(expiresAt);
  const when = new Intl.DateTimeFormat('en-GB', {
    dateStyle: 'medium',
    timeStyle: 'short',
    timeZone,
  }).format(at);
  const left = at.getTime() - now.getTime();
  if (left <= 0) return `expired (${when})`;
  const hours = Math.floor(left / HOUR);
  const words =
    hours < 1
      ? 'in less than an hour'
      : hours < 48
        ? `in ${hours} hour${hours === 1 ? '' : 's'}`
        : `in ${Math.floor(hours / 24)} days`;
  return `expires ${words} (${when})`;
}

/** Invitations not yet used: who, which role, until when; each can be withdrawn after asking. */
export function InvitationsList({
  invitations,
  timeZone,
}: {
  invitations: Invitation[];
  timeZone?: string;
}) {
  const revoke = useRevokeInvitation();
  const [now] = useState(() => new Date());
  const [withdrawn, setWithdrawn] = useState<string | null>(null);

  return (
    <Stack gap="3">
      <Box aria-live="polite" aria-atomic="true">
        {withdrawn && (
          <Text color="fg.success" fontWeight="medium">
            {withdrawn}
          </Text>
        )}
      </Box>
      {invitations.length === 0 ? (
        <Text color="fg.muted">No invitations are waiting to be accepted.</Text>
      ) : (
        <Stack as="ul" gap="2" listStyleType="none" aria-label="Pending invitations">
          {invitations.map((inv) => (
            <Flex
              as="li"
              key={inv.id}
              gap="3"
              justify="space-between"
              align={{ base: 'start', sm: 'center' }}
              direction={{ base: 'column', sm: 'row' }}
              borderWidth="1px"
              borderColor="border"
              borderRadius="l2"
              bg="bg.subtle"
              p="3"
            >
              <Stack gap="0.5" minW="0">
                <Flex gap="2" align="center" wrap="wrap">
                  <Text fontWeight="semibold">{inv.name}</Text>
                  <RoleBadge role={inv.role === 'chef' ? Role.Chef : Role.Staff} />
                </Flex>
                <Text textStyle="sm" wordBreak="break-all">
                  {inv.email}
                </Text>
                <Text textStyle="sm" color="fg.muted">
                  Invited by {inv.invitedBy || 'a chef'}; the link{' '}
                  {describeExpiry(inv.expiresAt, now, timeZone)}.
                </Text>
              </Stack>
              <ConfirmDialog
                trigger={
                  <Button
                    variant="outline"
                    size="sm"
                    colorPalette="danger"
                    flexShrink="0"
                    aria-label={`Withdraw the invitation to ${inv.email}`}
                  >
                    Withdraw
                  </Button>
                }
                title={`Withdraw the invitation to ${inv.name}?`}
                confirmLabel="Withdraw invitation"
                pendingLabel="Withdrawing…"
                danger
                onConfirm={() => revoke.mutateAsync(inv.id)}
                onDone={() => setWithdrawn(`The invitation to ${inv.email} was withdrawn.`)}
              >
                <Text>
                  The link sent to {inv.email} stops working at once. You can send a new invitation
                  later.
                </Text>
              </ConfirmDialog>
            </Flex>
          ))}
        </Stack>
      )}
    </Stack>
  );
}
