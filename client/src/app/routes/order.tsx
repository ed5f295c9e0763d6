import { Skeleton } from '@mantine/core';
import { useParams } from 'react-router-dom';
import { OrderStory } from '@/features/audit/components/order-story';
import { useOrder } from '@/api/orders/get-order';
import { OrderDetailScreen } from '@/features/orders/components/order-detail-screen';
import { usePatient } from '@/api/patients/get-patient';
import { PatientBanner } from '@/features/patients/components/patient-banner';
import { usePageTitle } from '@/hooks/use-page-title';
import { NotAnOrder } from './not-an-order';

export function Component() {
  usePageTitle('PCA order');
  const id = Number(useParams().orderId);
  const valid = Number.isInteger(id) && id > 0;
  // The screen reads the order from the same cache; the story rereads whenever the order does.
  const order = useOrder(valid ? id : null);
  const patientId = order.data?.patientId ?? null;
  const patient = usePatient(patientId);
  if (!valid) return <NotAnOrder />;
  return (
    <OrderDetailScreen
      key={id}
      orderId={id}
      weightKg={patient.data?.weightKg ?? null}
      patientBanner={patient.data ? <PatientBanner patient={patient.data} /> : <Skeleton height={96} />}
      story={<OrderStory orderId={id} orderUpdatedAt={order.dataUpdatedAt} />}
    />
  );
}
