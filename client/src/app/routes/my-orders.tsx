import { MyOrdersScreen } from '@/features/orders/components/my-orders-screen';
import { usePageTitle } from '@/hooks/use-page-title';

export function Component() {
  usePageTitle('My orders');
  return <MyOrdersScreen />;
}
