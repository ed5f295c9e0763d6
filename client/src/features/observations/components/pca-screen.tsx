import { Anchor, Button, Group, Skeleton, Stack, Title } from '@mantine/core';
import { IconArrowLeft, IconClipboardPlus } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { QueryErrorAlert } from '@/components/errors/query-error-alert';
import { canAccess } from '@/config/navigation';
import { paths } from '@/config/paths';
import { isApiRequestError } from '@/lib/api-error';
import { useCurrentUser } from '@/lib/auth/use-session';
import { useObservations } from '@/api/orders/get-observations';
import { useOrder } from '@/api/orders/get-order';
import type { UsageWindow } from '../utils/usage-windows';
import { useNow } from '@/hooks/use-now';
import { PcaPausePanel } from './pca-pause-panel';
import { FlagsPanel } from './flags-panel';
import { ObservationsTable } from './observations-table';
import { PcaHeader } from './pca-header';
import { UsageSection } from './usage-section';

export interface PcaScreenProps {
  orderId: number;
  hours: UsageWindow;
  onHoursChange: (hours: UsageWindow) => void;
}

/** One patient's PCA: open flags on top, then when the next observation is due, usage and charts. */
export function PcaScreen({ orderId, hours, onHoursChange }: PcaScreenProps) {
  const user = useCurrentUser();
  const now = useNow(30_000);
  // Flags are raised by anyone's observation: ask again on opening and every minute.
  const orderQuery = useOrder(orderId, { staleTime: 0, refetchInterval: 60_000 });
  const observations = useObservations(orderId);
  const order = orderQuery.data;

  if (orderQuery.isError) {
    const notFound = isApiRequestError(orderQuery.error) && orderQuery.error.status === 404;
    return (
      <QueryErrorAlert
        title={notFound ? 'PCA order not found' : 'The PCA order could not be loaded'}
        error={orderQuery.error}
        onRetry={notFound ? undefined : () => void orderQuery.refetch()}
      />
    );
  }
  if (!order) {
    return (
      <Stack gap="md" aria-busy aria-label="Loading the PCA">
        <Skeleton height={150} />
        <Skeleton height={120} />
        <Skeleton height={400} />
      </Stack>
    );
  }

  const mayObserve = canAccess(user.role, 'bedside') && order.status === 'active';
  return (
    <Stack gap="lg" maw={1280}>
      <Anchor component={Link} to={paths.patient.getHref(order.patientId)} size="sm">
        <Group gap={4} component="span">
          <IconArrowLeft size={16} aria-hidden />
          Back to the patient
        </Group>
      </Anchor>
      <PcaHeader
        order={order}
        actions={
          mayObserve ? (
            <Button
              component={Link}
              to={paths.pcaObserve.getHref(order.id)}
              size="md"
              leftSection={<IconClipboardPlus size={20} aria-hidden />}
            >
              Record observation
            </Button>
          ) : null
        }
      />
      <FlagsPanel orderId={order.id} flags={order.flags} />
      <PcaPausePanel order={order} mayAct={canAccess(user.role, 'bedside')} />
      <UsageSection orderId={order.id} hours={hours} onHoursChange={onHoursChange} now={now} />
      <Stack gap="sm" component="section" aria-labelledby="pca-observations-heading">
        <Title order={2} id="pca-observations-heading">
          Observations
        </Title>
        {observations.isError ? (
          <QueryErrorAlert
            title="Observations could not be loaded"
            error={observations.error}
            onRetry={() => void observations.refetch()}
          />
        ) : observations.data ? (
          <ObservationsTable observations={observations.data} />
        ) : (
          <Skeleton height={120} />
        )}
      </Stack>
    </Stack>
  );
}
