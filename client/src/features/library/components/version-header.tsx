import type { ReactNode } from 'react';
import { DataList, Group, Stack, Text, Title } from '@mantine/core';
import type { LibraryVersion } from '@lockstep/shared';
import { formatDateTime } from '@/utils/format-date';
import { VersionStatusBadge } from './version-status-badge';

function Fact({ label, children }: { label: string; children: ReactNode }) {
  return (
    <DataList.Item>
      <DataList.ItemLabel>{label}</DataList.ItemLabel>
      <DataList.ItemValue>{children}</DataList.ItemValue>
    </DataList.Item>
  );
}

/** Which version this is, who wrote and approved it, when, and why (its note). */
export function VersionHeader({ version }: { version: LibraryVersion }) {
  const plural = version.ruleCount === 1 ? 'rule' : 'rules';
  return (
    <Stack gap="sm">
      <Group gap="sm" align="center">
        <Title order={2}>
          {version.wardName} library, version {version.number}
        </Title>
        <VersionStatusBadge status={version.status} size="lg" />
        <Text size="sm" c="dimmed" className="tabular-nums">
          {version.ruleCount} {plural}
        </Text>
      </Group>
      <DataList labelWidth="8rem" size="sm" className="tabular-nums">
        <Fact label="Written by">
          {version.authorName}, {formatDateTime(version.createdAt)}
        </Fact>
        {version.submittedAt ? <Fact label="Submitted">{formatDateTime(version.submittedAt)}</Fact> : null}
        {version.approverName && version.approvedAt ? (
          <Fact label="Approved by">
            {version.approverName}, {formatDateTime(version.approvedAt)}
          </Fact>
        ) : null}
        {version.retiredAt ? <Fact label="Retired">{formatDateTime(version.retiredAt)}</Fact> : null}
        <Fact label="Note">
          {version.note || (
            <Text span size="sm" c="dimmed">
              No note
            </Text>
          )}
        </Fact>
      </DataList>
    </Stack>
  );
}
