import { PolicySignOffScreen } from '@/features/ward-policy/components/policy-sign-off-screen';
import { usePageTitle } from '@/hooks/use-page-title';

export function Component() {
  usePageTitle('Ward policy sign-off');
  return <PolicySignOffScreen />;
}
