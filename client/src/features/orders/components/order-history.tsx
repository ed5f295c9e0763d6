import { Text, Timeline } from '@mantine/core';
import { ORDER_STATUS_LABELS, type OrderEventResponse } from '@lockstep/shared';
import { formatDateTime } from '@/utils/format-date';

/** Every status change: who, when, and why. */
export function OrderHistory({ events }: { events: OrderEventResponse[] }) {
  return (
    <Timeline active={events.length - 1} bulletSize={14} lineWidth={2} aria-label="Status history">
      {events.map((event) => (
        <Timeline.Item
          key={event.id}
          title={event.fromStatus === null ? `Signed: ${ORDER_STATUS_LABELS[event.toStatus]}` : ORDER_STATUS_LABELS[event.toStatus]}
        >
          <Text size="sm" c="dimmed" className="tabular-nums">
            {event.userName} · {formatDateTime(event.at)}
          </Text>
          {event.reason ? <Text size="sm">{event.reason}</Text> : null}
        </Timeline.Item>
      ))}
    </Timeline>
  );
}
