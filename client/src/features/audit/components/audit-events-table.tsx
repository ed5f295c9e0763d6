import { useMemo, useState } from 'react';
import { Anchor, EmptyState, Text } from '@mantine/core';
import { IconHistoryOff } from '@tabler/icons-react';
import { createColumnHelper, getCoreRowModel, getSortedRowModel, useReactTable, type SortingState } from '@tanstack/react-table';
import { Link } from 'react-router-dom';
import { auditActionLabel, type AuditEvent, type Role } from '@lockstep/shared';
import { DataTable } from '@/components/ui/data-table';
import { formatDateTime } from '@/utils/format-date';
import { actorText } from '@/components/audit/audit-actor';
import { entityHref, entityLabel } from '../utils/audit-entity';
import { summaryFacts } from '@/components/audit/audit-summary';

export interface AuditEventsTableProps {
  events: AuditEvent[];
  role: Role;
  wardNames: ReadonlyMap<string, string>;
  isLoading: boolean;
  caption?: string;
  openId: number | null;
  onOpen: (event: AuditEvent) => void;
}

const column = createColumnHelper<AuditEvent>();
const SUMMARY_LINES = 2;

function summaryPreview(event: AuditEvent): string {
  const facts = summaryFacts(event.summary);
  const shown = facts.slice(0, SUMMARY_LINES).map((fact) => `${fact.label}: ${fact.value}`);
  return facts.length > SUMMARY_LINES ? `${shown.join('; ')}; …` : shown.join('; ');
}

/** One page of events; a row opens its details. Sorting reorders the page on screen only. */
export function AuditEventsTable({ events, role, wardNames, isLoading, caption, openId, onOpen }: AuditEventsTableProps) {
  const [sorting, setSorting] = useState<SortingState>([]);

  const columns = useMemo(
    () => [
      column.accessor('id', {
        header: '#',
        cell: ({ getValue }) => (
          <Text span size="sm" c="dimmed">
            {getValue()}
          </Text>
        ),
      }),
      column.accessor('at', {
        header: 'When',
        cell: ({ getValue }) => <time dateTime={getValue()}>{formatDateTime(getValue())}</time>,
      }),
      column.accessor((event) => actorText(event), { id: 'who', header: 'Who' }),
      column.accessor((event) => auditActionLabel(event.action), { id: 'action', header: 'Action' }),
      column.accessor((event) => entityLabel(event, wardNames), {
        id: 'entity',
        header: 'Record',
        cell: ({ row, getValue }) => {
          const href = entityHref(row.original, role);
          if (!href) return getValue();
          // The row itself opens the details; the link goes to the record instead.
          return (
            <Anchor component={Link} to={href} size="sm" onClick={(event) => event.stopPropagation()}>
              {getValue()}
            </Anchor>
          );
        },
      }),
      column.accessor(summaryPreview, {
        id: 'summary',
        header: 'Details',
        enableSorting: false,
        cell: ({ getValue }) => (
          <Text span size="sm" lineClamp={2} style={{ overflowWrap: 'anywhere' }}>
            {getValue()}
          </Text>
        ),
      }),
    ],
    [role, wardNames],
  );

  const table = useReactTable({
    data: events,
    columns,
    state: { sorting },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getRowId: (event) => String(event.id),
  });

  return (
    <DataTable
      table={table}
      label="Audit events"
      caption={caption}
      isLoading={isLoading}
      onRowOpen={onOpen}
      isRowCurrent={(event) => event.id === openId}
      empty={
        <EmptyState
          size="sm"
          icon={<IconHistoryOff aria-hidden />}
          title="No events found"
          description="Nothing recorded matches these filters."
        />
      }
    />
  );
}
