import { VerificationQueueScreen } from '@/features/orders/components/verification-queue-screen';
import { useWards } from '@/api/wards/get-wards';
import { usePageTitle } from '@/hooks/use-page-title';

export function Component() {
  usePageTitle('Verification');
  const wards = useWards();
  return <VerificationQueueScreen wards={wards.data ?? []} wardsLoading={wards.isPending} />;
}
