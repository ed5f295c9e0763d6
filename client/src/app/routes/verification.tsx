import { Skeleton } from '@mantine/core';
import { useParams } from 'react-router-dom';
import { useOrder } from '@/api/orders/get-order';
import { VerificationScreen } from '@/features/orders/components/verification-screen';
import { usePatient } from '@/api/patients/get-patient';
import { PatientBanner } from '@/features/patients/components/patient-banner';
import { usePageTitle } from '@/hooks/use-page-title';
import { NotAnOrder } from './not-an-order';

export function Component() {
  usePageTitle('Verify order');
  const id = Number(useParams().orderId);
  const valid = Number.isInteger(id) && id > 0;
  const order = useOrder(valid ? id : null);
  const patientId = order.data?.patientId ?? null;
  const patient = usePatient(patientId);
  if (!valid) return <NotAnOrder />;
  return (
    <VerificationScreen
      key={id}
      orderId={id}
      weightKg={patient.data?.weightKg ?? null}
      patientBanner={patient.data ? <PatientBanner patient={patient.data} /> : <Skeleton height={96} />}
    />
  );
}
