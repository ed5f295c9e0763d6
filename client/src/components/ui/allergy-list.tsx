import type { ComponentType, ReactNode } from 'react';
import { Badge, Group, Stack, Text } from '@mantine/core';
import { IconAlertOctagon, IconAlertTriangle, IconInfoCircle, IconQuestionMark, type IconProps } from '@tabler/icons-react';
import {
  ALLERGY_SEVERITY_LABELS,
  ALLERGY_STATUS_TEXT,
  allergyStatus,
  sortAllergies,
  type AllergySeverity,
  type PatientAllergyEntry,
} from '@lockstep/shared';
import { formatCalendarDate } from '@/utils/format-date';

/** Each severity's look: an icon and the word always, colour on top; anaphylaxis filled red so it stands out. */
export const ALLERGY_SEVERITY_LOOK: Readonly<Record<AllergySeverity, { Icon: ComponentType<IconProps>; color: string; filled: boolean }>> =
  {
    anaphylaxis: { Icon: IconAlertOctagon, color: 'red', filled: true },
    allergy: { Icon: IconAlertTriangle, color: 'orange', filled: false },
    intolerance: { Icon: IconInfoCircle, color: 'yellow', filled: false },
  };

function AllergySeverityBadge({ severity }: { severity: AllergySeverity }) {
  const { Icon, color, filled } = ALLERGY_SEVERITY_LOOK[severity];
  return (
    <Badge color={color} variant={filled ? 'filled' : 'light'} leftSection={<Icon size={14} aria-hidden />} style={{ flex: 'none' }}>
      {ALLERGY_SEVERITY_LABELS[severity]}
    </Badge>
  );
}

export interface AllergyListProps {
  patient: { allergies: readonly PatientAllergyEntry[]; noKnownAllergies: boolean };
  /** Something to put at the end of each entry's line (the patient page's remove button). */
  action?: (allergy: PatientAllergyEntry) => ReactNode;
  /** Adds who recorded each entry and when (the patient page). */
  withRecorder?: boolean;
}

/** "recorded by Dr Amara Osei, 1 Dec 2026", or that the entry came from the old free-text field. */
function recorderText(allergy: PatientAllergyEntry): string {
  if (allergy.recordedByName === null || allergy.recordedAt === null) return 'moved from the earlier free-text record';
  return `recorded by ${allergy.recordedByName}, ${formatCalendarDate(allergy.recordedAt.slice(0, 10))}`;
}

/**
 * The patient's allergies, most severe first, each with its severity as icon and word and its
 * reaction; "No known allergies" only when a clinician recorded it, "Allergies not recorded"
 * (with a warning icon) for an empty record.
 */
export function AllergyList({ patient, action, withRecorder = false }: AllergyListProps) {
  const status = allergyStatus(patient);
  if (status !== 'recorded') {
    const unknown = status === 'not-recorded';
    return (
      <Group gap={4} wrap="nowrap" data-allergy-status={status}>
        {unknown ? <IconQuestionMark size={16} color="var(--mantine-color-orange-7)" aria-hidden style={{ flex: 'none' }} /> : null}
        <Text size="sm" fw={unknown ? 600 : 500}>
          {ALLERGY_STATUS_TEXT[status]}
        </Text>
      </Group>
    );
  }
  return (
    <Stack gap={4} component="ul" m={0} p={0} style={{ listStyle: 'none' }} data-allergy-status={status}>
      {sortAllergies(patient.allergies).map((allergy) => (
        <Group key={allergy.id} component="li" gap="xs" wrap="nowrap" align="center" data-severity={allergy.severity}>
          <AllergySeverityBadge severity={allergy.severity} />
          <Text size="sm" fw={allergy.severity === 'anaphylaxis' ? 700 : 600}>
            {allergy.substance}
          </Text>
          <Text size="sm" c="dimmed">
            {allergy.reaction}
          </Text>
          {withRecorder ? (
            <Text size="xs" c="dimmed">
              ({recorderText(allergy)})
            </Text>
          ) : null}
          {action ? action(allergy) : null}
        </Group>
      ))}
    </Stack>
  );
}
