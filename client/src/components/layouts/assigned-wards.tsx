import { Group, Text, VisuallyHidden } from '@mantine/core';
import { IconBuildingHospital } from '@tabler/icons-react';
import type { SessionProfile } from '@lockstep/shared';

/** How the top bar names a person's wards: one or two by name, more by count. */
export function assignedWardsLabel(wards: SessionProfile['wards']): string | null {
  if (wards.length === 0) return null;
  if (wards.length <= 2) return wards.map((ward) => ward.name).join(' · ');
  return `${wards.length} wards`;
}

/** The wards the signed-in person works on, beside their name in the top bar. */
export function AssignedWards({ wards }: { wards: SessionProfile['wards'] }) {
  const label = assignedWardsLabel(wards);
  if (!label) return null;
  const all = wards.map((ward) => ward.name).join(', ');
  return (
    <Group gap={6} wrap="nowrap" visibleFrom="xs" title={all} data-testid="current-user-wards">
      <IconBuildingHospital size={18} aria-hidden color="var(--mantine-color-lagoon-7)" />
      <Text size="sm" fw={500}>
        <VisuallyHidden>Your wards: {all}</VisuallyHidden>
        <span aria-hidden>{label}</span>
      </Text>
    </Group>
  );
}
