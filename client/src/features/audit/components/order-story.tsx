import { useEffect, useRef, useState } from 'react';
import { EmptyState, Group, SegmentedControl, Skeleton, Stack, Text, Timeline } from '@mantine/core';
import { IconHistoryOff } from '@tabler/icons-react';
import { auditActionLabel } from '@lockstep/shared';
import { QueryErrorAlert } from '@/components/errors/query-error-alert';
import { useOrderAudit } from '@/api/orders/get-order-audit';
import { AuditEventByline } from '@/components/audit/audit-event-byline';
import { AuditSummaryList } from '@/components/audit/audit-summary-list';

type Order = 'oldest' | 'newest';

/**
 * Everything that happened to one order, from the audit trail: written, verified, released,
 * checked, observed, changed, discontinued; who did it and when.
 */
export interface OrderStoryProps {
  orderId: number;
  /** When the order itself was last read: a release or a check made on the page rereads the story too. */
  orderUpdatedAt?: number;
}

export function OrderStory({ orderId, orderUpdatedAt }: OrderStoryProps) {
  const audit = useOrderAudit(orderId);
  const { refetch } = audit;
  const seenUpdate = useRef(orderUpdatedAt);
  useEffect(() => {
    if (orderUpdatedAt === seenUpdate.current) return;
    seenUpdate.current = orderUpdatedAt;
    void refetch();
  }, [orderUpdatedAt, refetch]);
  // A ward team reads the story from the order onwards; the latest first is one click away.
  const [order, setOrder] = useState<Order>('oldest');

  if (audit.isPending) {
    return (
      <Stack gap="sm" aria-busy aria-label="Loading the order's story">
        <Skeleton height={18} width="50%" />
        <Skeleton height={18} width="70%" />
        <Skeleton height={18} width="60%" />
      </Stack>
    );
  }
  if (audit.isError) {
    return <QueryErrorAlert title="The order's story could not be loaded" error={audit.error} onRetry={() => void audit.refetch()} />;
  }
  const events = order === 'oldest' ? audit.data : [...audit.data].reverse();
  // Orders written before the audit trail began (or seeded) have only their later steps in it.
  const startsAtWriting = audit.data[0]?.action === 'order.create' || audit.data[0]?.action === 'order.revise';
  if (events.length === 0) {
    return (
      <EmptyState
        size="sm"
        icon={<IconHistoryOff aria-hidden />}
        title="No audit events for this order yet"
        description="It was written before Lockstep kept an audit trail; the header shows who signed it. Every step from now on appears here."
      />
    );
  }

  return (
    <Stack gap="md">
      <Group justify="space-between" align="center">
        <Text size="sm" c="dimmed">
          {events.length} {events.length === 1 ? 'event' : 'events'}
          {startsAtWriting ? '' : '. Steps taken before the audit trail began are not listed; the header shows who signed the order.'}
        </Text>
        <SegmentedControl
          size="xs"
          aria-label="Order of events"
          value={order}
          onChange={(value) => setOrder(value === 'newest' ? 'newest' : 'oldest')}
          data={[
            { value: 'oldest', label: 'Oldest first' },
            { value: 'newest', label: 'Newest first' },
          ]}
        />
      </Group>
      <Timeline active={events.length - 1} bulletSize={14} lineWidth={2} role="list" aria-label="Order story">
        {events.map((event) => (
          <Timeline.Item key={event.id} role="listitem" title={auditActionLabel(event.action)} data-testid="order-story-event">
            <Stack gap={4}>
              <AuditEventByline event={event} c="dimmed" className="tabular-nums" />
              <AuditSummaryList summary={event.summary} />
            </Stack>
          </Timeline.Item>
        ))}
      </Timeline>
    </Stack>
  );
}
