import type { KeyboardEvent, ReactNode } from 'react';
import { Group, Skeleton, Table, UnstyledButton } from '@mantine/core';
import { IconArrowDown, IconArrowUp, IconArrowsSort } from '@tabler/icons-react';
import { flexRender, type Header, type Row, type Table as TanstackTable } from '@tanstack/react-table';
import classes from './data-table.module.css';

export interface DataTableProps<T> {
  table: TanstackTable<T>;
  /** The table's accessible name, e.g. "Patients". */
  label: string;
  /** Visible line under the table, e.g. "Showing 4 of 12 patients". */
  caption?: ReactNode;
  isLoading?: boolean;
  /** Shown in place of the rows when there are none. */
  empty: ReactNode;
  /** Makes each row open its record on click and on Enter. */
  onRowOpen?: (row: T) => void;
  /** Marks the row whose record is open beside the table (`aria-current` and a bar). */
  isRowCurrent?: (row: T) => boolean;
  skeletonRows?: number;
}

type AriaSort = 'ascending' | 'descending' | 'none';

function ariaSort<T>(header: Header<T, unknown>): AriaSort | undefined {
  if (!header.column.getCanSort()) return undefined;
  const sorted = header.column.getIsSorted();
  if (sorted === 'asc') return 'ascending';
  if (sorted === 'desc') return 'descending';
  return 'none';
}

function SortIcon({ sorted }: { sorted: false | 'asc' | 'desc' }) {
  if (sorted === 'asc') return <IconArrowUp size={14} aria-hidden />;
  if (sorted === 'desc') return <IconArrowDown size={14} aria-hidden />;
  return <IconArrowsSort size={14} aria-hidden className={classes.idleSortIcon} />;
}

function HeaderCell<T>({ header }: { header: Header<T, unknown> }) {
  const content = header.isPlaceholder ? null : flexRender(header.column.columnDef.header, header.getContext());
  if (!header.column.getCanSort()) return <Table.Th>{content}</Table.Th>;
  return (
    <Table.Th aria-sort={ariaSort(header)}>
      <UnstyledButton className={classes.sortButton} onClick={header.column.getToggleSortingHandler()}>
        <Group gap={4} wrap="nowrap">
          <span>{content}</span>
          <SortIcon sorted={header.column.getIsSorted()} />
        </Group>
      </UnstyledButton>
    </Table.Th>
  );
}

/** A dense, sortable table over a TanStack table instance, with loading and empty states. */
export function DataTable<T>({ table, label, caption, isLoading, empty, onRowOpen, isRowCurrent, skeletonRows = 6 }: DataTableProps<T>) {
  const columnCount = table.getVisibleLeafColumns().length;
  const rows = table.getRowModel().rows;

  const rowProps = (row: Row<T>) => {
    const current = isRowCurrent?.(row.original) ?? false;
    const currentProps = current ? { 'aria-current': true, 'data-current': true } : {};
    if (!onRowOpen) return currentProps;
    return {
      ...currentProps,
      tabIndex: 0,
      className: 'row-link',
      onClick: () => onRowOpen(row.original),
      onKeyDown: (event: KeyboardEvent<HTMLTableRowElement>) => {
        if (event.key === 'Enter' && event.target === event.currentTarget) onRowOpen(row.original);
      },
    };
  };

  return (
    <Table.ScrollContainer minWidth={720}>
      <Table
        aria-label={label}
        aria-busy={isLoading || undefined}
        highlightOnHover={Boolean(onRowOpen)}
        stickyHeader
        tabularNums
        captionSide="bottom"
      >
        {caption ? <Table.Caption className={classes.caption}>{caption}</Table.Caption> : null}
        <Table.Thead>
          {table.getHeaderGroups().map((group) => (
            <Table.Tr key={group.id}>
              {group.headers.map((header) => (
                <HeaderCell key={header.id} header={header} />
              ))}
            </Table.Tr>
          ))}
        </Table.Thead>
        <Table.Tbody>
          {isLoading
            ? Array.from({ length: skeletonRows }, (_, index) => (
                <Table.Tr key={`skeleton-${index}`} aria-hidden>
                  {Array.from({ length: columnCount }, (_, cell) => (
                    <Table.Td key={cell}>
                      <Skeleton height={14} radius="sm" />
                    </Table.Td>
                  ))}
                </Table.Tr>
              ))
            : rows.map((row) => (
                <Table.Tr key={row.id} {...rowProps(row)}>
                  {row.getVisibleCells().map((cell) => (
                    <Table.Td key={cell.id}>{flexRender(cell.column.columnDef.cell, cell.getContext())}</Table.Td>
                  ))}
                </Table.Tr>
              ))}
          {!isLoading && rows.length === 0 ? (
            <Table.Tr>
              <Table.Td colSpan={columnCount}>{empty}</Table.Td>
            </Table.Tr>
          ) : null}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}
