import type { BadgeProps } from '@mantine/core';
import { IconArchive, IconCircleCheck, IconHourglassHigh, IconPencil } from '@tabler/icons-react';
import { LIBRARY_STATUS_LABELS, type LibraryStatus } from '@lockstep/shared';
import { StatusBadge, type StatusLook } from '@/components/ui/status-badge';

const STATUS_LOOK: Record<LibraryStatus, StatusLook> = {
  draft: { Icon: IconPencil, color: 'blue' },
  pending_approval: { Icon: IconHourglassHigh, color: 'orange' },
  active: { Icon: IconCircleCheck, color: 'green' },
  retired: { Icon: IconArchive, color: 'gray' },
};

/** A version's status as icon, word and colour. */
export function VersionStatusBadge({ status, size }: { status: LibraryStatus; size?: BadgeProps['size'] }) {
  return <StatusBadge look={STATUS_LOOK[status]} label={LIBRARY_STATUS_LABELS[status]} size={size} />;
}
