import { useState } from 'react';
import { Alert, Button, Card, Group, Skeleton, Stack, Text, Title } from '@mantine/core';
import { IconAdjustments, IconInfoCircle, IconSignature, IconX } from '@tabler/icons-react';
import { LOCAL_POLICY_CAUTION, type WardPolicyChange } from '@lockstep/shared';
import { QueryErrorAlert } from '@/components/errors/query-error-alert';
import { useCurrentUser } from '@/lib/auth/use-session';
import { formatDateTime } from '@/utils/format-date';
import { useWardPolicyChanges } from '@/api/ward-policy-changes/get-ward-policy-changes';
import { changeRows, signOffBlock } from '../utils/policy-change';
import { DeclineChangeModal } from './decline-change-modal';
import { SettingChangesTable } from './setting-changes-table';
import { SignOffChangeModal } from './sign-off-change-modal';

type Decision = { change: WardPolicyChange; kind: 'sign-off' | 'decline' };

function PendingChangeCard({ change, onDecide }: { change: WardPolicyChange; onDecide: (decision: Decision) => void }) {
  const user = useCurrentUser();
  const blocked = signOffBlock(change, user);
  const blockedId = `change-${change.id}-blocked`;
  return (
    <Card withBorder radius="md" padding="md" component="article" aria-labelledby={`change-${change.id}-title`}>
      <Stack gap="sm">
        <div>
          <Title order={2} size="h3" id={`change-${change.id}-title`}>
            {change.wardName}
          </Title>
          <Text size="sm" c="dimmed">
            Proposed by {change.proposedBy.name} · <time dateTime={change.proposedAt}>{formatDateTime(change.proposedAt)}</time>
          </Text>
        </div>
        <Text size="sm">
          <Text span fw={600} size="sm">
            Reason:
          </Text>{' '}
          {change.reason}
        </Text>
        <SettingChangesTable rows={changeRows(change.settings)} label={`${change.wardName}: settings to change`} withDefaults />
        {blocked ? (
          <Group gap={6} wrap="nowrap" id={blockedId}>
            <IconInfoCircle size={16} aria-hidden />
            <Text size="sm">{blocked}</Text>
          </Group>
        ) : null}
        <Group>
          <Button
            leftSection={<IconSignature size={16} aria-hidden />}
            disabled={blocked !== null}
            aria-describedby={blocked ? blockedId : undefined}
            onClick={() => onDecide({ change, kind: 'sign-off' })}
          >
            Sign off
          </Button>
          <Button
            variant="default"
            color="red"
            leftSection={<IconX size={16} aria-hidden />}
            disabled={blocked !== null}
            aria-describedby={blocked ? blockedId : undefined}
            onClick={() => onDecide({ change, kind: 'decline' })}
          >
            Decline
          </Button>
        </Group>
      </Stack>
    </Card>
  );
}

/** Charge nurses and pharmacists: the ward policy changes waiting for a clinical second signature. */
export function PolicySignOffScreen() {
  // Polled, so a change proposed while the page is open shows without a reload.
  const changes = useWardPolicyChanges({ status: 'pending' }, { refetchInterval: 60_000 });
  const [decision, setDecision] = useState<Decision | null>(null);

  let body;
  if (changes.isError)
    body = <QueryErrorAlert title="The changes could not be loaded" error={changes.error} onRetry={() => void changes.refetch()} />;
  else if (!changes.data) body = <Skeleton height={240} aria-label="Loading the changes" />;
  else if (changes.data.length === 0) body = <Text c="dimmed">No ward policy change is waiting for sign-off.</Text>;
  else body = changes.data.map((change) => <PendingChangeCard key={change.id} change={change} onDecide={setDecision} />);

  return (
    <Stack gap="lg" maw={860}>
      <Title order={1}>Ward policy sign-off</Title>
      <Alert color="lagoon" variant="light" icon={<IconAdjustments aria-hidden />} title="A second, clinical signature">
        An admin proposes a change to a ward&apos;s observation intervals or escalation thresholds; it applies only when a charge nurse or
        pharmacist signs it off. Each setting shows its value now, the value proposed and the default Lockstep shipped with. No setting can
        go past the published floors (the server refuses). {LOCAL_POLICY_CAUTION}
      </Alert>
      {body}
      {decision?.kind === 'sign-off' ? <SignOffChangeModal change={decision.change} onClose={() => setDecision(null)} /> : null}
      {decision?.kind === 'decline' ? <DeclineChangeModal change={decision.change} onClose={() => setDecision(null)} /> : null}
    </Stack>
  );
}
