import { useSearchParams } from 'react-router-dom';
import { USAGE_WINDOWS, type UsageWindow } from '@/features/observations/utils/usage-windows';
import { PcaScreen } from '@/features/observations/components/pca-screen';
import { usePageTitle } from '@/hooks/use-page-title';
import { NotAPcaOrder, usePcaOrderId } from './pca-order-id';

const DEFAULT_WINDOW: UsageWindow = 12;

function readWindow(value: string | null): UsageWindow {
  const hours = Number(value);
  return (USAGE_WINDOWS as readonly number[]).includes(hours) ? (hours as UsageWindow) : DEFAULT_WINDOW;
}

export function Component() {
  usePageTitle('PCA');
  const orderId = usePcaOrderId();
  // The chart window is in the address (`?hours=8`), so a reload or a shared link keeps it.
  const [search, setSearch] = useSearchParams();
  if (orderId === null) return <NotAPcaOrder />;
  const hours = readWindow(search.get('hours'));
  const setHours = (next: UsageWindow) => setSearch(next === DEFAULT_WINDOW ? {} : { hours: String(next) }, { replace: true });
  return <PcaScreen key={orderId} orderId={orderId} hours={hours} onHoursChange={setHours} />;
}
