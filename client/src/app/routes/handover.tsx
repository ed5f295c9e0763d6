import { HandoverScreen } from '@/features/handover/components/handover-screen';
import { useWards } from '@/api/wards/get-wards';
import { usePageTitle } from '@/hooks/use-page-title';
import { QueryErrorAlert } from '@/components/errors/query-error-alert';
import { useCurrentUser } from '@/lib/auth/use-session';

export function Component() {
  usePageTitle('Handover');
  const user = useCurrentUser();
  const wards = useWards();
  if (wards.isError) return <QueryErrorAlert title="Wards could not be loaded" error={wards.error} onRetry={() => void wards.refetch()} />;
  // The server lets nurses and charge nurses sign; prescribers and pharmacists read the board.
  const canSignOff = user.role === 'nurse' || user.role === 'charge_nurse';
  return <HandoverScreen wards={wards.data ?? []} wardsLoading={wards.isPending} canSignOff={canSignOff} />;
}
