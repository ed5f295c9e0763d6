import { useSearchParams } from 'react-router-dom';
import { QueryErrorAlert } from '@/components/errors/query-error-alert';
import { WardPolicyScreen } from '@/features/ward-policy/components/ward-policy-screen';
import { useWards } from '@/api/wards/get-wards';
import { usePageTitle } from '@/hooks/use-page-title';

export function Component() {
  usePageTitle('Ward policies');
  const wards = useWards();
  const [search, setSearch] = useSearchParams();
  const wardId = Number(search.get('ward'));
  if (wards.isError) return <QueryErrorAlert title="Wards could not be loaded" error={wards.error} onRetry={() => void wards.refetch()} />;
  return (
    <WardPolicyScreen
      wards={wards.data ?? []}
      wardsLoading={wards.isPending}
      wardId={Number.isInteger(wardId) && wardId > 0 ? wardId : null}
      onWardChange={(id) => setSearch({ ward: String(id) }, { replace: true })}
    />
  );
}
