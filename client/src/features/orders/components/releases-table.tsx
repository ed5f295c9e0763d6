import { Anchor, Badge, Table, Text } from '@mantine/core';
import { IconPrinter } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { formatDose, RELEASE_STATUS_LABELS, type SyringeReleaseResponse } from '@lockstep/shared';
import { paths } from '@/config/paths';
import { formatDateTime } from '@/utils/format-date';

export interface ReleasesTableProps {
  releases: SyringeReleaseResponse[];
  /** Pharmacy prints labels; other roles see the releases only. */
  canPrint: boolean;
}

/** The syringes released for an order, each with its release code. */
export function ReleasesTable({ releases, canPrint }: ReleasesTableProps) {
  if (releases.length === 0) {
    return (
      <Text size="sm" c="dimmed">
        No syringe has been released for this order.
      </Text>
    );
  }
  return (
    <Table.ScrollContainer minWidth={640}>
      <Table tabularNums aria-label="Syringe releases">
        <Table.Thead>
          <Table.Tr>
            <Table.Th>Release code</Table.Th>
            <Table.Th>Contents</Table.Th>
            <Table.Th>Batch</Table.Th>
            <Table.Th>Expires</Table.Th>
            <Table.Th>Status</Table.Th>
            <Table.Th>Released</Table.Th>
            {canPrint ? <Table.Th>Label</Table.Th> : null}
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {releases.map((release) => (
            <Table.Tr key={release.id}>
              <Table.Td ff="monospace" fw={700}>
                {release.releaseCode}
              </Table.Td>
              <Table.Td>
                {formatDose(release.totalAmount, release.doseUnit)} in {formatDose(release.volumeMl, 'mL')}
                {release.overrideReason ? (
                  <Text size="xs" c="dimmed">
                    Unusual volume: {release.overrideReason}
                  </Text>
                ) : null}
              </Table.Td>
              <Table.Td>{release.batch}</Table.Td>
              <Table.Td>{formatDateTime(release.expiresAt)}</Table.Td>
              <Table.Td>
                <Badge variant="light" color="gray" size="sm">
                  {RELEASE_STATUS_LABELS[release.status]}
                </Badge>
              </Table.Td>
              <Table.Td>
                {release.releasedByName}, {formatDateTime(release.releasedAt)}
              </Table.Td>
              {canPrint ? (
                <Table.Td>
                  <Anchor component={Link} to={paths.releaseLabel.getHref(release.orderId, release.id)} size="sm">
                    <IconPrinter size={14} aria-hidden /> Print label
                  </Anchor>
                </Table.Td>
              ) : null}
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}
