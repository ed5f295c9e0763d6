import { Text, type TextProps } from '@mantine/core';
import type { AuditEvent } from '@lockstep/shared';
import { formatDateTime } from '@/utils/format-date';
import { actorText } from './audit-actor';

/** "Lin Park · 2 Dec 2026, 08:29": who made the change, and when. */
export function AuditEventByline({ event, ...textProps }: { event: Pick<AuditEvent, 'actorName' | 'userId' | 'at'> } & TextProps) {
  return (
    <Text size="sm" {...textProps}>
      {actorText(event)} · <time dateTime={event.at}>{formatDateTime(event.at)}</time>
    </Text>
  );
}
