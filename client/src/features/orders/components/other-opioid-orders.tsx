import { Alert, Anchor, Badge, List, Stack, Text } from '@mantine/core';
import { IconAlertTriangle } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { describeOtherOrder, OPEN_ORDER_STATUSES, otherOpioidOrders, type OtherPcaOrder } from '@lockstep/shared';
import { paths } from '@/config/paths';
import { useOrders } from '@/api/orders/get-orders';

/** The queue's mark: the patient's other unfinished orders, named, so the pharmacist looks before verifying. */
export function OtherOpioidOrdersMark({ others }: { others: readonly OtherPcaOrder[] }) {
  if (others.length === 0) return null;
  return (
    <Stack gap={2} mt={4}>
      <Badge size="sm" variant="light" color="orange" leftSection={<IconAlertTriangle size={12} aria-hidden />}>
        Another opioid order
      </Badge>
      {others.map((other) => (
        <Text key={other.id} size="xs">
          {describeOtherOrder(other)}
        </Text>
      ))}
    </Stack>
  );
}

/** The same on the order under review, with links to each other order. */
export function OtherOpioidOrdersAlert({ orderId, patientId }: { orderId: number; patientId: number }) {
  const ordersQuery = useOrders({ patientId, status: OPEN_ORDER_STATUSES });
  const others = otherOpioidOrders(ordersQuery.data ?? [], orderId);
  if (others.length === 0) return null;
  return (
    <Alert color="orange" variant="light" icon={<IconAlertTriangle aria-hidden />} title="Another opioid order for this patient">
      <List size="sm">
        {others.map((other) => (
          <List.Item key={other.id}>
            <Anchor component={Link} to={paths.order.getHref(other.id)} size="sm">
              {describeOtherOrder(other)}
            </Anchor>
          </List.Item>
        ))}
      </List>
    </Alert>
  );
}
