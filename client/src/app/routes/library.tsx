import { QueryErrorAlert } from '@/components/errors/query-error-alert';
import { useDrugs } from '@/features/drugs/api/get-drugs';
import { LibraryScreen } from '@/features/library/components/library-screen';
import { useWards } from '@/features/wards/api/get-wards';
import { usePageTitle } from '@/hooks/use-page-title';

export function Component() {
  usePageTitle('Dose-limit library');
  const wards = useWards();
  // The rules editor's drug choices; loaded here so the library feature needs no other feature.
  const drugs = useDrugs();
  if (wards.isError) return <QueryErrorAlert title="Wards could not be loaded" error={wards.error} onRetry={() => void wards.refetch()} />;
  return <LibraryScreen wards={wards.data ?? []} wardsLoading={wards.isPending} drugs={drugs.data ?? []} />;
}
