import { Alert, Stack, Text } from '@mantine/core';
import { IconArrowBackUp } from '@tabler/icons-react';
import type { WardPolicyChange } from '@lockstep/shared';
import { formatDateTime } from '@/utils/format-date';
import { changeRows } from '../utils/policy-change';
import { SettingChangesTable } from './setting-changes-table';

/** The ward's last proposal, declined: the admin reads why before proposing again. */
export function DeclinedPolicyChange({ change }: { change: WardPolicyChange }) {
  return (
    <Alert color="gray" variant="light" icon={<IconArrowBackUp aria-hidden />} title="Last proposal declined" role="region">
      <Stack gap="xs">
        <Text size="sm">
          Proposed by {change.proposedBy.name}; declined by {change.decidedBy?.name ?? 'a clinician'}
          {change.decidedAt ? (
            <>
              {' '}
              · <time dateTime={change.decidedAt}>{formatDateTime(change.decidedAt)}</time>
            </>
          ) : null}
          . The ward kept its values.
        </Text>
        <Text size="sm">
          <Text span fw={600} size="sm">
            Why declined:
          </Text>{' '}
          {change.declineReason}
        </Text>
        <SettingChangesTable rows={changeRows(change.settings)} label="Settings proposed and declined" />
      </Stack>
    </Alert>
  );
}
