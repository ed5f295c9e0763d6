import { Button, Group, Paper, Stack, Text, Title } from '@mantine/core';
import { IconChartLine, IconClipboardPlus } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { OrderAlertBadges } from '@/components/ui/order-alert-badges';
import { canAccess } from '@/config/navigation';
import { paths } from '@/config/paths';
import { useNow } from '@/hooks/use-now';
import { useCurrentUser } from '@/lib/auth/use-session';
import { drugAndConcentration, regimenParts, type OrderStatus } from '@lockstep/shared';
import { useOrders } from '@/api/orders/get-orders';

const RUNNING: readonly OrderStatus[] = ['active'];

/** On the patient page: each running PCA, one click from its page (and, for nurses, its observation). */
export function PatientPcaOrders({ patientId }: { patientId: number }) {
  const user = useCurrentUser();
  // The patient's running PCAs, asked afresh each time the page opens.
  const orders = useOrders({ patientId, status: RUNNING }, { staleTime: 0 });
  const now = useNow(30_000);
  if (!orders.data || orders.data.length === 0) return null;
  const mayObserve = canAccess(user.role, 'bedside');
  return (
    <Stack gap="sm" component="section" aria-labelledby="patient-pca-heading">
      <Title order={2} id="patient-pca-heading">
        Running PCA
      </Title>
      {orders.data.map((order) => (
        <Paper key={order.id} withBorder radius="md" p="md">
          <Group justify="space-between" wrap="wrap" gap="sm">
            <div>
              <Text fw={700}>{drugAndConcentration(order)}</Text>
              <Text size="sm" c="dimmed" className="tabular-nums">
                {regimenParts(order)
                  .map((part) => `${part.label} ${part.value}`)
                  .join(' · ')}
              </Text>
              <OrderAlertBadges
                paused={order.paused}
                openUrgentFlags={order.openUrgentFlags}
                nextObservation={order.nextObservation}
                now={now}
              />
            </div>
            <Group gap="xs">
              {mayObserve ? (
                <Button
                  component={Link}
                  to={paths.pcaObserve.getHref(order.id)}
                  variant="default"
                  leftSection={<IconClipboardPlus size={16} aria-hidden />}
                >
                  Record observation
                </Button>
              ) : null}
              <Button
                component={Link}
                to={paths.pca.getHref(order.id)}
                leftSection={<IconChartLine size={16} aria-hidden />}
                aria-label={`PCA page: ${drugAndConcentration(order)}`}
              >
                PCA page
              </Button>
            </Group>
          </Group>
        </Paper>
      ))}
    </Stack>
  );
}
