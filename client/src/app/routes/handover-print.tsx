import { Navigate, useSearchParams } from 'react-router-dom';
import { paths } from '@/config/paths';
import { HandoverPrintScreen } from '@/features/handover/components/handover-print-screen';
import { usePageTitle } from '@/hooks/use-page-title';
import { useCurrentUser } from '@/lib/auth/use-session';

export function Component() {
  usePageTitle('Handover sheet');
  const user = useCurrentUser();
  const [searchParams] = useSearchParams();
  const wardId = Number(searchParams.get('ward'));
  // No ward named: the board, which picks one.
  if (!Number.isInteger(wardId) || wardId <= 0) return <Navigate to={paths.handover.getHref()} replace />;
  return <HandoverPrintScreen wardId={wardId} printedBy={user.displayName} />;
}
