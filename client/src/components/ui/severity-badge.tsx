import { Badge, type BadgeProps } from '@mantine/core';
import { SEVERITY_LOOK, type Severity } from './severity-look';

export interface SeverityBadgeProps extends Omit<BadgeProps, 'color' | 'leftSection' | 'children'> {
  severity: Severity;
  /** The word, when it should say more than the level ("Urgent: overdue"). */
  label?: string;
}

/** A severity as a badge: icon + word + colour, filled when urgent. */
export function SeverityBadge({ severity, label, ...props }: SeverityBadgeProps) {
  const { color, icon: Icon, label: word } = SEVERITY_LOOK[severity];
  return (
    <Badge color={color} variant={severity === 'urgent' ? 'filled' : 'light'} leftSection={<Icon size={14} aria-hidden />} {...props}>
      {label ?? word}
    </Badge>
  );
}
