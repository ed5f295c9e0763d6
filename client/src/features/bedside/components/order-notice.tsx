import type { ReactNode } from 'react';
import { Alert, Button, Group, Stack, Text } from '@mantine/core';
import { IconInfoCircle } from '@tabler/icons-react';
import { Link } from 'react-router-dom';

export interface OrderNoticeProps {
  title: string;
  children: ReactNode;
  /** Where to go instead, e.g. the syringe change when a syringe is still running. */
  action?: { label: string; to: string };
}

/** Why a bedside task cannot be done for this order now, and what to do instead. */
export function OrderNotice({ title, children, action }: OrderNoticeProps) {
  return (
    <Alert color="blue" variant="light" icon={<IconInfoCircle aria-hidden />} title={title}>
      <Stack gap="sm">
        <Text size="sm">{children}</Text>
        {action ? (
          <Group>
            <Button component={Link} to={action.to} variant="light">
              {action.label}
            </Button>
          </Group>
        ) : null}
      </Stack>
    </Alert>
  );
}
