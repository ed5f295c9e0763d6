import type { ComponentType } from 'react';
import { Alert, Text } from '@mantine/core';
import { IconAlertOctagon, IconAlertTriangle, IconInfoCircle, type IconProps } from '@tabler/icons-react';
import { FLAG_SEVERITY_LABELS, type FlagResponse, type FlagSeverity } from '@lockstep/shared';

const SEVERITY_LOOK: Record<FlagSeverity, { color: string; icon: ComponentType<IconProps> }> = {
  urgent: { color: 'red', icon: IconAlertOctagon },
  review: { color: 'orange', icon: IconAlertTriangle },
  info: { color: 'blue', icon: IconInfoCircle },
};

/** A flag: severity as icon + word + colour, what happened, and what to do. */
export function FlagAlert({ flag }: { flag: Pick<FlagResponse, 'severity' | 'message' | 'action'> }) {
  const look = SEVERITY_LOOK[flag.severity];
  const Icon = look.icon;
  return (
    <Alert
      color={look.color}
      variant="light"
      icon={<Icon aria-hidden />}
      title={`Flag: ${FLAG_SEVERITY_LABELS[flag.severity]}`}
      role="alert"
    >
      <Text size="sm" className="tabular-nums">
        {flag.message}
      </Text>
      <Text size="sm" mt={4}>
        <Text span fw={600} inherit>
          Action:{' '}
        </Text>
        {flag.action}
      </Text>
    </Alert>
  );
}
