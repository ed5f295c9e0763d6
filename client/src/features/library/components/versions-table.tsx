import { useMemo } from 'react';
import { EmptyState, Text } from '@mantine/core';
import { IconBooks } from '@tabler/icons-react';
import { createColumnHelper, getCoreRowModel, useReactTable } from '@tanstack/react-table';
import type { LibraryVersion } from '@lockstep/shared';
import { DataTable } from '@/components/ui/data-table';
import { formatDateTime } from '@/utils/format-date';
import { VersionStatusBadge } from './version-status-badge';

const column = createColumnHelper<LibraryVersion>();

function When({ value }: { value: string | null }) {
  if (!value)
    return (
      <Text span size="sm" c="dimmed">
        –
      </Text>
    );
  return <span style={{ whiteSpace: 'nowrap' }}>{formatDateTime(value)}</span>;
}

// Newest first, as the server sends them; sorting would only hide the order of events.
const columns = [
  column.accessor('number', {
    header: 'Version',
    cell: ({ getValue }) => (
      <Text span size="sm" fw={600}>
        Version {getValue()}
      </Text>
    ),
  }),
  column.accessor('status', { header: 'Status', cell: ({ getValue }) => <VersionStatusBadge status={getValue()} /> }),
  column.accessor('authorName', { header: 'Written by' }),
  column.accessor('createdAt', { header: 'Created', cell: ({ getValue }) => <When value={getValue()} /> }),
  column.accessor('submittedAt', { header: 'Submitted', cell: ({ getValue }) => <When value={getValue()} /> }),
  column.accessor('approverName', {
    header: 'Approved by',
    cell: ({ getValue }) =>
      getValue() ?? (
        <Text span size="sm" c="dimmed">
          –
        </Text>
      ),
  }),
  column.accessor('approvedAt', { header: 'Approved', cell: ({ getValue }) => <When value={getValue()} /> }),
  column.accessor('ruleCount', { header: 'Rules' }),
];

export interface VersionsTableProps {
  versions: LibraryVersion[];
  isLoading: boolean;
  currentVersionId: number | null;
  onOpen: (version: LibraryVersion) => void;
}

/** The ward's library versions; a row opens that version below. */
export function VersionsTable({ versions, isLoading, currentVersionId, onOpen }: VersionsTableProps) {
  const table = useReactTable({
    data: versions,
    columns,
    getCoreRowModel: getCoreRowModel(),
    getRowId: (version) => String(version.id),
    enableSorting: false,
  });
  const caption = useMemo(() => (isLoading ? undefined : 'Choose a version to see its rules.'), [isLoading]);

  return (
    <DataTable
      table={table}
      label="Library versions"
      caption={caption}
      isLoading={isLoading}
      skeletonRows={2}
      onRowOpen={onOpen}
      isRowCurrent={(version) => version.id === currentVersionId}
      empty={
        <EmptyState
          size="sm"
          icon={<IconBooks aria-hidden />}
          title="No versions yet"
          description="Import a CSV to start this ward's library."
        />
      }
    />
  );
}
