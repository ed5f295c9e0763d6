import { VerificationQueueScreen } from '@/features/orders/components/verification-queue-screen';
import { useWards } from '@/features/wards/api/get-wards';
import { usePageTitle } from '@/hooks/use-page-title';

export function Component() {
  usePageTitle('Verification');
  const wards = useWards();
  return <VerificationQueueScreen wards={wards.data ?? []} wardsLoading={wards.isPending} />;
}
