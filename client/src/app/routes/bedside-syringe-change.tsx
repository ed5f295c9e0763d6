import { SyringeChangeScreen } from '@/features/bedside/components/syringe-change-screen';
import { usePageTitle } from '@/hooks/use-page-title';
import { NotAnOrder, useBedsideOrderId } from './bedside-order-id';

export function Component() {
  usePageTitle('Change syringe');
  const orderId = useBedsideOrderId();
  if (orderId === null) return <NotAnOrder />;
  return <SyringeChangeScreen key={orderId} orderId={orderId} />;
}
