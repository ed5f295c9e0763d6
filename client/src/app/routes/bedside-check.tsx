import { QueryErrorAlert } from '@/components/errors/query-error-alert';
import { BedsideCheckScreen } from '@/features/bedside/components/bedside-check-screen';
import { useDrugs } from '@/api/drugs/get-drugs';
import { usePageTitle } from '@/hooks/use-page-title';
import { NotAnOrder, useBedsideOrderId } from './bedside-order-id';

export function Component() {
  usePageTitle('Bedside check');
  const orderId = useBedsideOrderId();
  // The drug choices of each nurse's entry.
  const drugs = useDrugs();
  if (orderId === null) return <NotAnOrder />;
  if (drugs.isError) return <QueryErrorAlert title="Drugs could not be loaded" error={drugs.error} onRetry={() => void drugs.refetch()} />;
  // Keyed by order: moving to another order starts a new check with empty forms.
  return <BedsideCheckScreen key={orderId} orderId={orderId} drugs={drugs.data ?? []} />;
}
