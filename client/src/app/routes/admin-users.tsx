import { UsersScreen } from '@/features/users/components/users-screen';
import { useWards } from '@/api/wards/get-wards';
import { usePageTitle } from '@/hooks/use-page-title';

export function Component() {
  usePageTitle('Users');
  const wards = useWards();
  return <UsersScreen wards={wards.data ?? []} wardsLoading={wards.isPending} />;
}
