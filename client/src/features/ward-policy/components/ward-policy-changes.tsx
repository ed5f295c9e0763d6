import { Anchor, Card, Group, Skeleton, Stack, Text, Title } from '@mantine/core';
import { Link } from 'react-router-dom';
import { useAuditEvents } from '@/api/audit/get-audit-events';
import { AuditEventByline } from '@/components/audit/audit-event-byline';
import { AuditSummaryList } from '@/components/audit/audit-summary-list';
import { QueryErrorAlert } from '@/components/errors/query-error-alert';
import { paths } from '@/config/paths';

const SHOWN = 5;

/** The last changes to this ward's policy, from the audit trail: who changed what, from and to. */
export function WardPolicyChanges({ wardId }: { wardId: number }) {
  const changes = useAuditEvents({ entityType: 'ward', entityId: String(wardId), action: 'ward.policy-update', limit: SHOWN });

  let body;
  if (changes.isError)
    body = <QueryErrorAlert title="The changes could not be loaded" error={changes.error} onRetry={() => void changes.refetch()} />;
  else if (!changes.data) body = <Skeleton height={120} aria-label="Loading the changes" />;
  else if (changes.data.events.length === 0)
    body = <Text c="dimmed">No changes since the ward was set up: every value is as shipped or as first loaded.</Text>;
  else {
    body = (
      <Stack gap="sm">
        {changes.data.events.map((event) => (
          <Card key={event.id} withBorder padding="sm">
            <AuditEventByline event={event} fw={500} mb={4} />
            <AuditSummaryList summary={event.summary} />
          </Card>
        ))}
      </Stack>
    );
  }

  return (
    <Stack gap="xs" component="section" aria-labelledby="ward-policy-changes">
      <Group justify="space-between" align="baseline">
        <Title order={2} size="h3" id="ward-policy-changes">
          Recent changes
        </Title>
        {changes.data && changes.data.total > SHOWN && (
          <Anchor component={Link} to={paths.adminAudit.getHref({ entityType: 'ward', entityId: String(wardId) })} size="sm">
            All {changes.data.total} changes
          </Anchor>
        )}
      </Group>
      {body}
    </Stack>
  );
}
