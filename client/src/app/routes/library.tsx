import { QueryErrorAlert } from '@/components/errors/query-error-alert';
import { useDrugs } from '@/api/drugs/get-drugs';
import { LibraryScreen } from '@/features/library/components/library-screen';
import { useWards } from '@/api/wards/get-wards';
import { usePageTitle } from '@/hooks/use-page-title';

export function Component() {
  usePageTitle('Dose-limit library');
  const wards = useWards();
  // The rules editor's drug choices.
  const drugs = useDrugs();
  if (wards.isError) return <QueryErrorAlert title="Wards could not be loaded" error={wards.error} onRetry={() => void wards.refetch()} />;
  return <LibraryScreen wards={wards.data ?? []} wardsLoading={wards.isPending} drugs={drugs.data ?? []} />;
}
