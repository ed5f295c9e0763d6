import { Group, Text } from '@mantine/core';
import { SEVERITY_LOOK, type Severity } from './severity-look';

export interface SeverityLabelProps {
  severity: Severity;
  /** Shown after the word, e.g. a count ("Urgent 1") or a time ("Overdue 12 min"). */
  detail?: string;
  /** Replaces the severity's own word ("Overdue" for an observation that is a review). */
  word?: string;
  size?: 'xs' | 'sm';
}

/** A severity inline: icon + word (+ detail) in the severity's colour. */
export function SeverityLabel({ severity, detail, word, size = 'sm' }: SeverityLabelProps) {
  const look = SEVERITY_LOOK[severity];
  const Icon = look.icon;
  return (
    <Group gap={4} wrap="nowrap" c={look.textColor}>
      <Icon size={size === 'sm' ? 16 : 14} aria-hidden style={{ flexShrink: 0 }} />
      <Text size={size} fw={severity === 'routine' ? 400 : 600} c="inherit" style={{ whiteSpace: 'nowrap' }}>
        {word ?? look.label}
        {detail ? ` ${detail}` : ''}
      </Text>
    </Group>
  );
}
