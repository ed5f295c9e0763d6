import { EquianalgesicScreen } from '@/features/equianalgesic/components/equianalgesic-screen';
import { usePageTitle } from '@/hooks/use-page-title';

export function Component() {
  usePageTitle('Equianalgesic factors');
  return <EquianalgesicScreen />;
}
