import { Alert, Stack, Text } from '@mantine/core';
import { IconHourglass } from '@tabler/icons-react';
import type { WardPolicyChange } from '@lockstep/shared';
import { formatDateTime } from '@/utils/format-date';
import { changeRows } from '../utils/policy-change';
import { SettingChangesTable } from './setting-changes-table';

/** The change waiting on this ward, above the admin's form: it applies only once a clinician signs it off. */
export function PendingPolicyChange({ change }: { change: WardPolicyChange }) {
  return (
    <Alert
      color="yellow"
      variant="light"
      icon={<IconHourglass aria-hidden />}
      title="Awaiting sign-off by a charge nurse or pharmacist"
      // A standing notice, not an interruption: a region named by its title.
      role="region"
    >
      <Stack gap="xs">
        <Text size="sm">
          Proposed by {change.proposedBy.name} · <time dateTime={change.proposedAt}>{formatDateTime(change.proposedAt)}</time>. The ward
          works to its current values until the change is signed off.
        </Text>
        <Text size="sm">
          <Text span fw={600} size="sm">
            Reason:
          </Text>{' '}
          {change.reason}
        </Text>
        <SettingChangesTable rows={changeRows(change.settings)} label="Settings awaiting sign-off" />
      </Stack>
    </Alert>
  );
}
