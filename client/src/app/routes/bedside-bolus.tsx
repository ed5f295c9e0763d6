import { BolusScreen } from '@/features/bedside/components/bolus-screen';
import { usePageTitle } from '@/hooks/use-page-title';
import { NotAnOrder, useBedsideOrderId } from './bedside-order-id';

export function Component() {
  usePageTitle('Clinician bolus');
  const orderId = useBedsideOrderId();
  if (orderId === null) return <NotAnOrder />;
  return <BolusScreen key={orderId} orderId={orderId} />;
}
