import { ObservationsDueScreen } from '@/features/bedside/components/observations-due-screen';
import { useWards } from '@/api/wards/get-wards';
import { usePageTitle } from '@/hooks/use-page-title';

export function Component() {
  usePageTitle('Observations due');
  const wards = useWards();
  return <ObservationsDueScreen wards={wards.data ?? []} wardsLoading={wards.isPending} />;
}
