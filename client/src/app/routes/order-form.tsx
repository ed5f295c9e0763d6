import { Anchor, Group, Stack, Text, Title } from '@mantine/core';
import { IconArrowLeft } from '@tabler/icons-react';
import { Link, useParams } from 'react-router-dom';
import { QueryErrorAlert } from '@/components/errors/query-error-alert';
import { PageLoader } from '@/components/ui/page-loader';
import { paths } from '@/config/paths';
import { useActiveLibrary } from '@/api/library/get-active-library';
import { useOrder } from '@/api/orders/get-order';
import { OrderFormScreen } from '@/features/orders/components/order-form-screen';
import { usePatient } from '@/api/patients/get-patient';
import { PatientBanner } from '@/features/patients/components/patient-banner';
import { useWards } from '@/api/wards/get-wards';
import { usePageTitle } from '@/hooks/use-page-title';
import { isApiRequestError } from '@/lib/api-error';

function positiveId(value: string | undefined): number | null {
  const id = Number(value);
  return Number.isInteger(id) && id > 0 ? id : null;
}

// New order (/patients/:patientId/orders/new) and revision (/orders/:orderId/revise) share the
// form; this route gathers the order being revised, the patient, the ward's active library and the wards.
export function Component() {
  const params = useParams();
  const revisingId = positiveId(params.orderId);
  usePageTitle(revisingId ? 'Revise PCA order' : 'New PCA order');
  const revising = useOrder(revisingId);
  const patientId = revisingId ? (revising.data?.patientId ?? null) : positiveId(params.patientId);
  const patient = usePatient(patientId);
  const wards = useWards();
  const library = useActiveLibrary(patient.data?.wardId ?? null);

  const back = patientId ? (
    <Anchor component={Link} to={paths.patient.getHref(patientId)} size="sm">
      <Group gap={4} component="span">
        <IconArrowLeft size={16} aria-hidden />
        Back to the patient
      </Group>
    </Anchor>
  ) : null;

  if (!revisingId && !patientId) {
    return (
      <Stack gap="sm">
        <Title order={1}>Patient not found</Title>
        <Text>This address does not name a patient.</Text>
      </Stack>
    );
  }
  const failed = [revising, patient, library, wards].find((query) => query.isError);
  if (failed?.error) {
    const noLibrary = failed === library && isApiRequestError(library.error) && library.error.status === 404;
    return (
      <Stack gap="md">
        {back}
        <QueryErrorAlert
          title={
            noLibrary
              ? 'This ward has no active dose-limit library: a PCA order cannot be written until pharmacy approves one'
              : 'The order form could not be loaded'
          }
          error={failed.error}
          onRetry={noLibrary ? undefined : () => void failed.refetch()}
        />
      </Stack>
    );
  }
  if ((revisingId && !revising.data) || !patient.data || !library.data || !wards.data) return <PageLoader />;

  if (revising.data && revising.data.status !== 'returned') {
    return (
      <Stack gap="sm">
        {back}
        <Title order={1}>This order cannot be revised</Title>
        <Text>
          Only an order returned with a query is revised. Order {revising.data.id} is{' '}
          <Anchor component={Link} to={paths.order.getHref(revising.data.id)}>
            no longer returned
          </Anchor>
          .
        </Text>
      </Stack>
    );
  }
  const ward = wards.data.find((candidate) => candidate.id === patient.data.wardId);
  return (
    <Stack gap="md">
      {back}
      <OrderFormScreen
        key={revisingId ?? `new-${patientId}`}
        patient={patient.data}
        rules={library.data.rules}
        weightBasedWard={ward?.weightBasedDosing ?? false}
        patientBanner={<PatientBanner patient={patient.data} />}
        revising={revising.data}
      />
    </Stack>
  );
}
