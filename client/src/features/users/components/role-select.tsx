import { Select, type SelectProps } from '@mantine/core';
import { ROLE_LABELS, ROLES, type Role } from '@lockstep/shared';

export const ROLE_OPTIONS = ROLES.map((role) => ({ value: role, label: ROLE_LABELS[role] }));

export function isRole(value: string | null): value is Role {
  return value !== null && (ROLES as readonly string[]).includes(value);
}

export interface RoleSelectProps extends Omit<SelectProps, 'data' | 'value' | 'onChange'> {
  value: Role | null;
  onChange: (role: Role | null) => void;
}

export function RoleSelect({ value, onChange, ...props }: RoleSelectProps) {
  return (
    <Select {...props} data={ROLE_OPTIONS} value={value} onChange={(next) => onChange(isRole(next) ? next : null)} allowDeselect={false} />
  );
}
