import type { ComponentType } from 'react';
import { Group, Text, ThemeIcon } from '@mantine/core';
import { IconAlertTriangle, IconBan, IconCircleX, IconInfoCircle, type IconProps } from '@tabler/icons-react';
import type { Finding, FindingSeverity } from '@lockstep/shared';

type SeverityLook = { word: string; effect: string; color: string; Icon: ComponentType<IconProps> };

/** Icon, word and colour for each severity: never colour alone. */
export const SEVERITY_LOOK: Record<FindingSeverity, SeverityLook> = {
  error: { word: 'Error', effect: 'blocks signing', color: 'red', Icon: IconCircleX },
  hard: { word: 'Hard limit', effect: 'blocks signing', color: 'red', Icon: IconBan },
  soft: { word: 'Soft limit', effect: 'needs a reason', color: 'orange', Icon: IconAlertTriangle },
  caution: { word: 'Caution', effect: 'for information', color: 'blue', Icon: IconInfoCircle },
};

// Hard and soft findings that are not limits (an allergy, a second open PCA, the patient's risk)
// say what they do without calling themselves limits.
const NOT_A_LIMIT_LOOK: Partial<Record<FindingSeverity, SeverityLook>> = {
  hard: { ...SEVERITY_LOOK.hard, word: 'Blocked', effect: 'cannot be signed' },
  soft: { ...SEVERITY_LOOK.soft, word: 'Check', effect: 'needs a reason' },
};

/** The finding's look: limits (`limit.*`, `possible.*`) as hard or soft limits, anything else by what it does. */
export function findingLook(finding: Finding): SeverityLook {
  const isLimit = finding.code.startsWith('limit.') || finding.code.startsWith('possible.');
  return (isLimit ? undefined : NOT_A_LIMIT_LOOK[finding.severity]) ?? SEVERITY_LOOK[finding.severity];
}

export interface FindingLineProps {
  finding: Finding;
  /** Adds what the severity means ("blocks signing") after the word. */
  withEffect?: boolean;
  /** Writes the override reason given for a soft finding under it. */
  reason?: string;
  id?: string;
}

/** One finding: its severity as icon + word + colour, then the message. */
export function FindingLine({ finding, withEffect = false, reason, id }: FindingLineProps) {
  const { word, effect, color, Icon } = findingLook(finding);
  return (
    <Group gap={8} wrap="nowrap" align="flex-start" id={id} data-severity={finding.severity}>
      <ThemeIcon size={22} variant="light" color={color} radius="xl" mt={1} aria-hidden>
        <Icon size={15} />
      </ThemeIcon>
      <div>
        <Text size="sm" lh={1.45}>
          <Text span fw={600} c={`${color}.8`} size="sm">
            {word}
            {withEffect ? ` (${effect})` : ''}:
          </Text>{' '}
          {finding.message}
        </Text>
        {reason ? (
          <Text size="sm" c="dimmed" lh={1.45}>
            Reason given: {reason}
          </Text>
        ) : null}
      </div>
    </Group>
  );
}
