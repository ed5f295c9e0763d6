import type { ReactNode } from 'react';
import { Alert, DataList, Group, Stack, Text, Title } from '@mantine/core';
import { IconMessageReply } from '@tabler/icons-react';
import { LIBRARY_CONTRIBUTION_LABELS, type LibraryVersion, type LibraryVersionDetail } from '@lockstep/shared';
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

/**
 * Which version this is, who created, imported, edited, submitted and approved it, when, why (its
 * note), and the comment it was last sent back with.
 */
export function VersionHeader({ version }: { version: LibraryVersion & Partial<Pick<LibraryVersionDetail, 'contributors' | 'sentBack'>> }) {
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
        {version.contributors && version.contributors.length > 0 ? (
          <Fact label="Worked on by">
            <Stack gap={2} component="ul" style={{ listStyle: 'none', margin: 0, padding: 0 }} aria-label="Who worked on this version">
              {version.contributors.map((contributor, index) => (
                <li key={index}>
                  {LIBRARY_CONTRIBUTION_LABELS[contributor.action]}: {contributor.userName}, {formatDateTime(contributor.at)}
                </li>
              ))}
            </Stack>
          </Fact>
        ) : null}
        <Fact label="Note">
          {version.note || (
            <Text span size="sm" c="dimmed">
              No note
            </Text>
          )}
        </Fact>
      </DataList>
      {version.sentBack ? (
        <Alert
          color="orange"
          variant="light"
          icon={<IconMessageReply aria-hidden />}
          title={`Sent back by ${version.sentBack.byName}, ${formatDateTime(version.sentBack.at)}`}
        >
          {version.sentBack.comment}
        </Alert>
      ) : null}
    </Stack>
  );
}
