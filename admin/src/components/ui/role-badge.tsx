import { Badge } from '@chakra-ui/react';
import { Role } from '@nappe/shared';

const LABELS: Record<Role, string> = {
  [Role.Chef]: 'Chef',
  [Role.Staff]: 'Staff',
  [Role.Client]: 'Client',
};

const PALETTES: Record<Role, string> = {
  [Role.Chef]: 'caramel',
  [Role.Staff]: 'accent',
  [Role.Client]: 'gray',
};

export function roleLabel(role: Role): string {
  return LABELS[role];
}

/** The role in words (never colour alone). */
export function RoleBadge({ role }: { role: Role }) {
  return (
    <Badge colorPalette={PALETTES[role]} variant="subtle" size="md">
      {LABELS[role]}
    </Badge>
  );
}
