import type { SelectOption } from '@/components/ui';
import { type Role, ROLE_DESCRIPTIONS, ROLE_LABELS, ROLES } from '@/lib/roles';

export const roleOptions: SelectOption<Role>[] = ROLES.map((role) => ({
  value: role,
  label: ROLE_LABELS[role],
  description: ROLE_DESCRIPTIONS[role],
}));
