import { Alert, Text } from '@mantine/core';
import { FLAG_SEVERITY_LABELS, type FlagResponse } from '@lockstep/shared';
import { SEVERITY_LOOK } from '@/components/ui/severity-look';

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
