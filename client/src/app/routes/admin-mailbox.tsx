import { MailboxScreen } from '@/features/mailbox/components/mailbox-screen';
import { usePageTitle } from '@/hooks/use-page-title';

export function Component() {
  usePageTitle('Mailbox');
  return <MailboxScreen />;
}
