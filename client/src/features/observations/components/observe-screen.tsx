import { useState } from 'react';
import { Alert, Anchor, Group, Paper, Skeleton, Stack, Text, Title } from '@mantine/core';
import { IconArrowLeft, IconInfoCircle } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import {
  DECISION_SUPPORT_CAUTION,
  drugAndConcentration,
  formatDose,
  ORDER_STATUS_LABELS,
  type ObservationResponse,
  type OrderDetail,
  type RecordedObservation,
} from '@lockstep/shared';
import { useWardPolicy } from '@/api/wards/get-ward-policy';
import { QueryErrorAlert } from '@/components/errors/query-error-alert';
import { paths } from '@/config/paths';
import { isApiRequestError } from '@/lib/api-error';
import { formatDateTime } from '@/utils/format-date';
import { useObservations } from '@/api/orders/get-observations';
import { useOrder } from '@/api/orders/get-order';
import { ObservationForm } from './observation-form';
import { ObservationSaved } from './observation-saved';

function Context({ order, last }: { order: OrderDetail; last: ObservationResponse | undefined }) {
  return (
    <Paper withBorder radius="md" p="md">
      <Group justify="space-between" wrap="wrap" gap="xs">
        <div>
          <Text fw={700} fz="lg">
            {order.patientName}
          </Text>
          <Text c="dimmed" className="tabular-nums">
            MRN {order.patientMrn} · {order.wardName} bed {order.bed}
          </Text>
        </div>
        <Text fw={700} fz="lg">
          {drugAndConcentration(order)}
        </Text>
      </Group>
      <Text size="sm" mt="xs" className="tabular-nums" data-testid="last-observation">
        {last
          ? `Last observation ${formatDateTime(last.at)}: sedation ${last.sedationLevel}, respiratory rate ${last.respiratoryRate}/min, SpO2 ${last.spo2} %, pain ${last.painScore}/10; pump ${last.attempts} attempts, ${last.delivered} delivered, ${formatDose(last.volumeInfusedMl, 'mL')} infused.`
          : 'No observation yet for this PCA.'}
      </Text>
    </Paper>
  );
}

/** The bedside task of recording one observation, and the flags it raised. */
export function ObserveScreen({ orderId }: { orderId: number }) {
  // Flags are raised by anyone's observation: ask again on opening and every minute.
  const orderQuery = useOrder(orderId, { staleTime: 0, refetchInterval: 60_000 });
  const observations = useObservations(orderId);
  const policy = useWardPolicy(orderQuery.data?.wardId ?? null);
  const [saved, setSaved] = useState<RecordedObservation | null>(null);
  // A new key gives "Record another" an empty form.
  const [formKey, setFormKey] = useState(0);
  const order = orderQuery.data;

  let body;
  if (orderQuery.isError || observations.isError) {
    const error = orderQuery.error ?? observations.error;
    const notFound = isApiRequestError(error) && error.status === 404;
    body = (
      <QueryErrorAlert
        title={notFound ? 'PCA order not found' : 'The PCA could not be loaded'}
        error={error}
        onRetry={notFound ? undefined : () => void Promise.all([orderQuery.refetch(), observations.refetch()])}
      />
    );
  } else if (!order || !observations.data) {
    body = <Skeleton height={600} aria-label="Loading the PCA" />;
  } else {
    const running = order.releases.some((release) => release.status === 'in_use');
    body = (
      <>
        <Context order={order} last={observations.data.at(-1)} />
        {saved ? (
          <ObservationSaved
            orderId={order.id}
            observation={saved}
            onRecordAnother={() => {
              setSaved(null);
              setFormKey((key) => key + 1);
            }}
          />
        ) : order.status !== 'active' || !running ? (
          <Alert color="gray" variant="light" icon={<IconInfoCircle aria-hidden />} title="No observation can be recorded">
            {order.status !== 'active'
              ? `Observations are recorded on an active PCA; this one is ${ORDER_STATUS_LABELS[order.status].toLowerCase()}.`
              : 'No syringe is running: finish the bedside check first.'}
          </Alert>
        ) : (
          <ObservationForm key={formKey} order={order} observations={observations.data} thresholds={policy.data} onSaved={setSaved} />
        )}
      </>
    );
  }

  return (
    <Stack gap="lg" maw={1100}>
      <Anchor component={Link} to={paths.pca.getHref(orderId)} size="sm">
        <Group gap={4} component="span">
          <IconArrowLeft size={16} aria-hidden />
          Back to the PCA page
        </Group>
      </Anchor>
      <Title order={1}>Record observation</Title>
      {body}
      <Text size="xs" c="dimmed">
        {DECISION_SUPPORT_CAUTION}
      </Text>
    </Stack>
  );
}
