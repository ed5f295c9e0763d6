import { Badge } from '@mantine/core';
import { IconCircleCheck, IconCircleOff } from '@tabler/icons-react';

export function UserStatusBadge({ active }: { active: boolean }) {
  return active ? (
    <Badge color="green" variant="light" leftSection={<IconCircleCheck size={12} aria-hidden />}>
      Active
    </Badge>
  ) : (
    <Badge color="gray" variant="light" leftSection={<IconCircleOff size={12} aria-hidden />}>
      Inactive
    </Badge>
  );
}
