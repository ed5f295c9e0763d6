import { ResumeScreen } from '@/features/bedside/components/resume-screen';
import { usePageTitle } from '@/hooks/use-page-title';
import { NotAnOrder, useBedsideOrderId } from './bedside-order-id';

export function Component() {
  usePageTitle('Resume PCA');
  const orderId = useBedsideOrderId();
  if (orderId === null) return <NotAnOrder />;
  return <ResumeScreen key={orderId} orderId={orderId} />;
}
