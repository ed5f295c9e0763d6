import type { ComponentType } from 'react';
import { Group, Text } from '@mantine/core';
import { IconAlertOctagon, IconAlertTriangle, IconCircleDashed, IconInfoCircle, type IconProps } from '@tabler/icons-react';
import { FLAG_SEVERITY_LABELS } from '@lockstep/shared';
import type { RowSeverity } from '../utils/board-filters';

export interface SeverityLook {
  label: string;
  color: string;
  icon: ComponentType<IconProps>;
}

// Severity is always icon + word + colour (BRIEF, "Look and feel"): the shapes differ as well as
// the colours, so a black-and-white print or a colour-blind reader loses nothing.
export const SEVERITY_LOOK: Record<RowSeverity, SeverityLook> = {
  urgent: { label: FLAG_SEVERITY_LABELS.urgent, color: 'red.8', icon: IconAlertOctagon },
  review: { label: FLAG_SEVERITY_LABELS.review, color: 'orange.9', icon: IconAlertTriangle },
  info: { label: FLAG_SEVERITY_LABELS.info, color: 'blue.8', icon: IconInfoCircle },
  routine: { label: 'Routine', color: 'slate.7', icon: IconCircleDashed },
};

export interface SeverityLabelProps {
  severity: RowSeverity;
  /** Shown after the word, e.g. a count ("Urgent 1") or a time ("Overdue 12 min"). */
  detail?: string;
  /** Replaces the severity's own word ("Overdue" for an observation that is a review). */
  word?: string;
  size?: 'xs' | 'sm';
}

/** Icon + word (+ detail) in the severity's colour. */
export function SeverityLabel({ severity, detail, word, size = 'sm' }: SeverityLabelProps) {
  const look = SEVERITY_LOOK[severity];
  const Icon = look.icon;
  return (
    <Group gap={4} wrap="nowrap" c={look.color}>
      <Icon size={size === 'sm' ? 16 : 14} aria-hidden style={{ flexShrink: 0 }} />
      <Text size={size} fw={severity === 'routine' ? 400 : 600} c="inherit" style={{ whiteSpace: 'nowrap' }}>
        {word ?? look.label}
        {detail ? ` ${detail}` : ''}
      </Text>
    </Group>
  );
}
