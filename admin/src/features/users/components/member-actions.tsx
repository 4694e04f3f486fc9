import { Button, Stack, Text, VisuallyHidden } from '@chakra-ui/react';
import { Role } from '@nappe/shared';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { useChangeRole } from '../api/change-role';
import type { UserListItem } from '../api/get-users';
import { useRemoveUser } from '../api/remove-user';

/** Who may be changed here: team members other than the chef looking (the API refuses self-removal). */
export function memberActionsFor(user: UserListItem, currentUserId: string) {
  if (user.role === Role.Client) return 'client' as const;
  if (user.id === currentUserId) return 'self' as const;
  return 'member' as const;
}

/**
 * Make a member chef or staff, or remove them, each after a confirmation that says when it takes
 * effect: on the member's next request (the API reads their role afresh every time, and a removed
 * member's sessions are ended).
 */
export function MemberActions({
  user,
  currentUserId,
  onDone,
}: {
  user: UserListItem;
  currentUserId: string;
  onDone: (message: string) => void;
}) {
  const changeRole = useChangeRole();
  const remove = useRemoveUser();
  const kind = memberActionsFor(user, currentUserId);

  if (kind === 'client') {
    return (
      <Text textStyle="sm" color="fg.muted">
        <span aria-hidden>—</span>
        <VisuallyHidden>No team actions: a client account</VisuallyHidden>
      </Text>
    );
  }
  if (kind === 'self') {
    return (
      <Text textStyle="sm" color="fg.muted">
        You
        <VisuallyHidden>: another chef can change or remove your account</VisuallyHidden>
      </Text>
    );
  }

  const toChef = user.role === Role.Staff;
  const newRole = toChef ? 'chef' : 'staff';
  return (
    <Stack
      direction={{ base: 'column', sm: 'row' }}
      gap="2"
      align={{ base: 'stretch', sm: 'center' }}
    >
      <ConfirmDialog
        trigger={
          <Button
            variant="outline"
            size="xs"
            aria-label={`${toChef ? 'Make chef' : 'Make staff'}: ${user.name}`}
          >
            {toChef ? 'Make chef' : 'Make staff'}
          </Button>
        }
        title={toChef ? `Make ${user.name} a chef?` : `Make ${user.name} staff?`}
        confirmLabel={toChef ? 'Make chef' : 'Make staff'}
        pendingLabel="Changing…"
        onConfirm={() => changeRole.mutateAsync({ id: user.id, role: newRole })}
        onDone={() => onDone(`${user.name} is now ${toChef ? 'a chef' : 'staff'}.`)}
      >
        <Text>
          {toChef
            ? 'As a chef they can confirm orders, change prices, recipes and settings, and manage the team.'
            : 'As staff they keep Today, Prep, Allergy notes and a read-only Kitchen; orders, settings, team and figures close to them.'}
        </Text>
        <Text fontWeight="medium">This applies on their next request: they need not sign out.</Text>
      </ConfirmDialog>
      <ConfirmDialog
        trigger={
          <Button
            variant="outline"
            size="xs"
            colorPalette="danger"
            aria-label={`Remove ${user.name}`}
          >
            Remove
          </Button>
        }
        title={`Remove ${user.name} from the team?`}
        confirmLabel="Remove from the team"
        pendingLabel="Removing…"
        danger
        onConfirm={() => remove.mutateAsync(user.id)}
        onDone={() => onDone(`${user.name} was removed from the team.`)}
      >
        <Text>
          They can no longer sign in, and their open sessions end on their next request. What they
          did stays in the records. You can invite them again later.
        </Text>
      </ConfirmDialog>
    </Stack>
  );
}
