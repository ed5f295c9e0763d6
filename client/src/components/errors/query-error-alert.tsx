import { Alert, Button, Group, Text } from '@mantine/core';
import { IconAlertCircle } from '@tabler/icons-react';
import { errorMessage } from '@/lib/api-error';

export interface QueryErrorAlertProps {
  title: string;
  error: unknown;
  onRetry?: () => void;
}

/** What a screen shows when its data could not be loaded. */
export function QueryErrorAlert({ title, error, onRetry }: QueryErrorAlertProps) {
  return (
    <Alert color="red" variant="light" title={title} icon={<IconAlertCircle aria-hidden />}>
      <Group justify="space-between" align="center" gap="sm">
        <Text size="sm">{errorMessage(error)}</Text>
        {onRetry ? (
          <Button size="xs" variant="default" onClick={onRetry}>
            Try again
          </Button>
        ) : null}
      </Group>
    </Alert>
  );
}
