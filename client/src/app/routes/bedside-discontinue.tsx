import { DiscontinueScreen } from '@/features/bedside/components/discontinue-screen';
import { usePageTitle } from '@/hooks/use-page-title';
import { NotAnOrder, useBedsideOrderId } from './bedside-order-id';

export function Component() {
  usePageTitle('Discontinue PCA');
  const orderId = useBedsideOrderId();
  if (orderId === null) return <NotAnOrder />;
  return <DiscontinueScreen key={orderId} orderId={orderId} />;
}
