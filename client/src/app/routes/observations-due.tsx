import { ObservationsDueScreen } from '@/features/bedside/components/observations-due-screen';
import { usePageTitle } from '@/hooks/use-page-title';

export function Component() {
  usePageTitle('Observations due');
  return <ObservationsDueScreen />;
}
