import { Button, Group, Stack, Text, Title } from '@mantine/core';
import { IconRefresh } from '@tabler/icons-react';
import { QueryErrorAlert } from '@/components/errors/query-error-alert';
import { formatDateTime } from '@/utils/format-date';
import { useMailbox } from '../api/get-mailbox';
import { MailboxTable } from './mailbox-table';

/** The local mailbox: every e-mail Lockstep has sent, as the built-in mail catcher received it. */
export function MailboxScreen() {
  const mailbox = useMailbox();
  const count = mailbox.data?.length ?? 0;
  return (
    <Stack gap="md">
      <Group justify="space-between" align="flex-end">
        <div>
          <Title order={1}>Mailbox</Title>
          <Text size="sm" c="dimmed">
            E-mails Lockstep has sent, newest first. They stay on this server: nothing leaves it.
          </Text>
        </div>
        <Group gap="sm" align="center">
          {mailbox.dataUpdatedAt > 0 ? (
            <Text size="xs" c="dimmed" aria-live="polite">
              {count} {count === 1 ? 'message' : 'messages'} · checked {formatDateTime(new Date(mailbox.dataUpdatedAt).toISOString())}
            </Text>
          ) : null}
          <Button
            variant="default"
            leftSection={<IconRefresh size={16} aria-hidden />}
            loading={mailbox.isFetching}
            onClick={() => void mailbox.refetch()}
          >
            Refresh
          </Button>
        </Group>
      </Group>
      {mailbox.isError ? (
        <QueryErrorAlert title="The mailbox could not be loaded" error={mailbox.error} onRetry={() => void mailbox.refetch()} />
      ) : (
        <MailboxTable messages={mailbox.data ?? []} isLoading={mailbox.isPending} />
      )}
    </Stack>
  );
}
