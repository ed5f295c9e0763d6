import type { ReactNode } from 'react';
import { Anchor, Group, Skeleton, Stack } from '@mantine/core';
import { IconArrowLeft } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { QueryErrorAlert } from '@/components/errors/query-error-alert';
import { paths } from '@/config/paths';
import { isApiRequestError } from '@/lib/api-error';
import { usePatient } from '@/api/patients/get-patient';
import { PatientDetails } from './patient-details';

function BackLink() {
  return (
    <Anchor component={Link} to={paths.patients.getHref()} size="sm">
      <Group gap={4} component="span">
        <IconArrowLeft size={16} aria-hidden />
        Back to patients
      </Group>
    </Anchor>
  );
}

export interface PatientScreenProps {
  patientId: number;
  /** What other features show on the patient page once the patient is loaded (PCA orders). */
  children?: ReactNode;
}

export function PatientScreen({ patientId, children }: PatientScreenProps) {
  const patientQuery = usePatient(patientId);

  let body;
  if (patientQuery.isPending) {
    body = (
      <Stack gap="md" aria-busy aria-label="Loading patient">
        <Skeleton height={32} width="40%" />
        <Skeleton height={140} />
      </Stack>
    );
  } else if (patientQuery.isError) {
    const notFound = isApiRequestError(patientQuery.error) && patientQuery.error.status === 404;
    body = (
      <QueryErrorAlert
        title={notFound ? 'Patient not found' : 'The patient could not be loaded'}
        error={patientQuery.error}
        onRetry={notFound ? undefined : () => void patientQuery.refetch()}
      />
    );
  } else {
    body = <PatientDetails patient={patientQuery.data} />;
  }

  return (
    <Stack gap="md">
      <BackLink />
      {body}
      {patientQuery.isSuccess ? children : null}
    </Stack>
  );
}
