import { useMemo } from 'react';
import { ActionIcon, Anchor, Indicator, Popover, Stack, Text } from '@mantine/core';
import { IconBell } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { drugAndConcentration } from '@lockstep/shared';
import { SeverityBadge } from '@/components/ui/severity-badge';
import { paths } from '@/config/paths';
import { useOrders } from '@/api/orders/get-orders';
import { urgentFlagsLabel, urgentNotifications } from '@/utils/order-alerts';

/** The prescriber's notifications: their running PCAs with open urgent flags, each linking to its PCA page. */
export function UrgentFlagsBell() {
  // Polled, so a flag raised at the bedside reaches the prescriber in the app, not only by e-mail.
  const ordersQuery = useOrders({ mine: true, status: ['active'] }, { refetchInterval: 60_000 });
  const urgent = useMemo(() => urgentNotifications(ordersQuery.data ?? []), [ordersQuery.data]);
  const count = urgent.reduce((sum, order) => sum + order.openUrgentFlags, 0);
  const label = count === 0 ? 'Notifications: no urgent flags open' : `Notifications: ${urgentFlagsLabel(count)}`;
  return (
    <Popover position="bottom-end" width={320} shadow="md">
      <Popover.Target>
        <Indicator label={count} size={18} color="red" disabled={count === 0}>
          <ActionIcon variant="default" size="lg" aria-label={label}>
            <IconBell size={18} aria-hidden />
          </ActionIcon>
        </Indicator>
      </Popover.Target>
      <Popover.Dropdown>
        {urgent.length === 0 ? (
          <Text size="sm">No urgent flags are open on your patients’ PCAs.</Text>
        ) : (
          <Stack gap="sm" component="ul" style={{ listStyle: 'none', margin: 0, padding: 0 }} aria-label="Urgent flags">
            {urgent.map((order) => (
              <li key={order.id}>
                <SeverityBadge severity="urgent" size="sm" label={urgentFlagsLabel(order.openUrgentFlags)} />
                <Anchor component={Link} to={paths.pca.getHref(order.id)} size="sm" fw={600} display="block">
                  {order.patientName}, {order.wardName} bed {order.bed}
                </Anchor>
                <Text size="xs" c="dimmed">
                  {drugAndConcentration(order)}
                </Text>
              </li>
            ))}
          </Stack>
        )}
      </Popover.Dropdown>
    </Popover>
  );
}
