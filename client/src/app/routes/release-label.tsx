import { useParams } from 'react-router-dom';
import { ReleaseLabelScreen } from '@/features/orders/components/release-label-screen';
import { usePageTitle } from '@/hooks/use-page-title';
import { NotAnOrder } from './not-an-order';

export function Component() {
  usePageTitle('Syringe label');
  const params = useParams();
  const orderId = Number(params.orderId);
  const releaseId = Number(params.releaseId);
  if (!Number.isInteger(orderId) || orderId <= 0 || !Number.isInteger(releaseId) || releaseId <= 0) return <NotAnOrder />;
  return <ReleaseLabelScreen orderId={orderId} releaseId={releaseId} />;
}
