import type { ComponentType } from 'react';
import { Badge, type BadgeProps } from '@mantine/core';
import { IconAlertOctagon, IconAlertTriangle, IconInfoCircle, type IconProps } from '@tabler/icons-react';
import { FLAG_SEVERITY_LABELS, type FlagSeverity } from '@lockstep/shared';

/** Severity is always icon + word + colour, never colour alone. */
export const SEVERITY_LOOK: Record<FlagSeverity, { color: string; icon: ComponentType<IconProps> }> = {
  urgent: { color: 'red', icon: IconAlertOctagon },
  review: { color: 'orange', icon: IconAlertTriangle },
  info: { color: 'blue', icon: IconInfoCircle },
};

export interface SeverityBadgeProps extends Omit<BadgeProps, 'color' | 'leftSection' | 'children'> {
  severity: FlagSeverity;
  /** The word, when it should say more than the level ("Urgent: overdue"). */
  label?: string;
}

export function SeverityBadge({ severity, label, ...props }: SeverityBadgeProps) {
  const { color, icon: Icon } = SEVERITY_LOOK[severity];
  return (
    <Badge color={color} variant={severity === 'urgent' ? 'filled' : 'light'} leftSection={<Icon size={14} aria-hidden />} {...props}>
      {label ?? FLAG_SEVERITY_LABELS[severity]}
    </Badge>
  );
}
