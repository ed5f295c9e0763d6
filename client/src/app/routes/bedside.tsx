import { BedsideOrdersScreen } from '@/features/bedside/components/bedside-orders-screen';
import { useWards } from '@/api/wards/get-wards';
import { usePageTitle } from '@/hooks/use-page-title';

export function Component() {
  usePageTitle('PCA orders');
  const wards = useWards();
  return <BedsideOrdersScreen wards={wards.data ?? []} wardsLoading={wards.isPending} />;
}
