import { Anchor, Stack, Text, Title } from '@mantine/core';
import { Link, useParams } from 'react-router-dom';
import { paths } from '@/config/paths';
import { PatientBedsideLink } from '@/features/bedside/components/patient-bedside-link';
import { PatientPcaOrders } from '@/features/observations/components/patient-pca-orders';
import { PatientOrders } from '@/features/orders/components/patient-orders';
import { PatientScreen } from '@/features/patients/components/patient-screen';
import { usePageTitle } from '@/hooks/use-page-title';

export function Component() {
  usePageTitle('Patient');
  const { patientId } = useParams();
  const id = Number(patientId);

  if (!Number.isInteger(id) || id <= 0) {
    return (
      <Stack gap="sm">
        <Title order={1}>Patient not found</Title>
        <Text>This address does not name a patient.</Text>
        <Anchor component={Link} to={paths.patients.getHref()}>
          Back to patients
        </Anchor>
      </Stack>
    );
  }
  // Keyed by id so moving between patients never shows the previous one's details.
  return (
    <PatientScreen key={id} patientId={id}>
      <PatientPcaOrders patientId={id} />
      <PatientBedsideLink patientId={id} />
      <PatientOrders patientId={id} />
    </PatientScreen>
  );
}
