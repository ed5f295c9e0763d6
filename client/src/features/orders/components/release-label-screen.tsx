import { Anchor, Button, Group, Stack, Text, Title } from '@mantine/core';
import { IconArrowLeft, IconPrinter } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { formatDose, tallMan } from '@lockstep/shared';
import { QueryErrorAlert } from '@/components/errors/query-error-alert';
import { paths } from '@/config/paths';
import { formatDateTime } from '@/utils/format-date';
import { useOrder } from '@/api/orders/get-order';
import { OrderLoading } from './order-detail-screen';
import classes from './release-label.module.css';

export interface ReleaseLabelScreenProps {
  orderId: number;
  releaseId: number;
}

/** The printable label of one syringe release; printing hides everything but the label. */
export function ReleaseLabelScreen({ orderId, releaseId }: ReleaseLabelScreenProps) {
  const orderQuery = useOrder(orderId);
  if (orderQuery.isPending) return <OrderLoading />;
  if (orderQuery.isError)
    return <QueryErrorAlert title="The label could not be loaded" error={orderQuery.error} onRetry={() => void orderQuery.refetch()} />;
  const order = orderQuery.data;
  const release = order.releases.find((candidate) => candidate.id === releaseId);

  const back = (
    <Anchor component={Link} to={paths.order.getHref(order.id)} size="sm">
      <Group gap={4} component="span">
        <IconArrowLeft size={16} aria-hidden />
        Back to order {order.id}
      </Group>
    </Anchor>
  );
  if (!release) {
    return (
      <Stack gap="sm">
        {back}
        <Title order={1}>Label not found</Title>
        <Text>Order {order.id} has no syringe release with this number.</Text>
      </Stack>
    );
  }

  return (
    <Stack gap="md">
      <Stack gap="sm" className={classes.noPrint}>
        {back}
        <Group justify="space-between" align="center">
          <Title order={1}>Syringe label</Title>
          <Button leftSection={<IconPrinter size={16} aria-hidden />} onClick={() => window.print()}>
            Print label
          </Button>
        </Group>
        <Text size="sm" c="dimmed">
          Shown at its printed size. Check it against the syringe before the syringe leaves pharmacy.
        </Text>
      </Stack>
      <article className={classes.label} aria-label="Syringe label">
        <div className={classes.patientName}>{order.patientName}</div>
        <div className={classes.small}>
          MRN {order.patientMrn} · {order.wardName}, bed {order.bed}
        </div>
        <div className={classes.drug}>
          {tallMan(order.drugName)} {formatDose(release.concentrationPerMl, `${release.doseUnit}/mL`)}
        </div>
        <div className={classes.amount}>
          {formatDose(release.totalAmount, release.doseUnit)} in {formatDose(release.volumeMl, 'mL')}
        </div>
        <div className={classes.small}>
          Batch {release.batch} · Expires {formatDateTime(release.expiresAt)}
        </div>
        <div className={classes.small}>
          Prepared by {release.preparedBy} · checked by {release.checkedBy}
        </div>
        <div className={classes.code}>
          <div className={classes.small}>Release code</div>
          <div className={classes.codeValue} data-testid="label-release-code">
            {release.releaseCode}
          </div>
        </div>
        <div className={classes.only}>For PCA use by this patient only.</div>
      </article>
    </Stack>
  );
}
