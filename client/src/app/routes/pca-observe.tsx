import { ObserveScreen } from '@/features/observations/components/observe-screen';
import { usePageTitle } from '@/hooks/use-page-title';
import { NotAPcaOrder, usePcaOrderId } from './pca-order-id';

export function Component() {
  usePageTitle('Record observation');
  const orderId = usePcaOrderId();
  if (orderId === null) return <NotAPcaOrder />;
  // Keyed by order: another order starts from an empty form.
  return <ObserveScreen key={orderId} orderId={orderId} />;
}
