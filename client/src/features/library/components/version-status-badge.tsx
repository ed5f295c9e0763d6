import type { ComponentType } from 'react';
import { Badge, type BadgeProps } from '@mantine/core';
import { IconArchive, IconCircleCheck, IconHourglassHigh, IconPencil, type IconProps } from '@tabler/icons-react';
import { LIBRARY_STATUS_LABELS, type LibraryStatus } from '@lockstep/shared';

const STATUS_LOOK: Record<LibraryStatus, { Icon: ComponentType<IconProps>; color: string }> = {
  draft: { Icon: IconPencil, color: 'blue' },
  pending_approval: { Icon: IconHourglassHigh, color: 'orange' },
  active: { Icon: IconCircleCheck, color: 'green' },
  retired: { Icon: IconArchive, color: 'gray' },
};

/** A version's status as icon, word and colour. */
export function VersionStatusBadge({ status, size = 'sm' }: { status: LibraryStatus; size?: BadgeProps['size'] }) {
  const { Icon, color } = STATUS_LOOK[status];
  return (
    <Badge color={color} variant="light" size={size} leftSection={<Icon size={size === 'lg' ? 14 : 12} aria-hidden />}>
      {LIBRARY_STATUS_LABELS[status]}
    </Badge>
  );
}
