import { useMemo, useState } from 'react';
import { Anchor, Button, EmptyState, Group, Stack, Text } from '@mantine/core';
import { IconArrowBackUp, IconClipboardList, IconPencil, IconSquareX } from '@tabler/icons-react';
import { createColumnHelper, getCoreRowModel, getSortedRowModel, useReactTable, type SortingState } from '@tanstack/react-table';
import { Link } from 'react-router-dom';
import { canCancel, formatRegimen, type OrderListEntry, type OrderSummary } from '@lockstep/shared';
import { DataTable } from '@/components/ui/data-table';
import { OrderStatusBadge } from '@/components/ui/order-status-badge';
import { PausedBadge } from '@/components/ui/paused-badge';
import { paths } from '@/config/paths';
import { formatDateTime } from '@/utils/format-date';

export interface OrdersTableProps {
  orders: OrderSummary[];
  label: string;
  isLoading: boolean;
  empty: string;
  /** My orders: the patient column instead of the prescriber's (every order there is one's own). */
  showPatient: boolean;
  onOpen: (order: OrderSummary) => void;
  /** Revise and cancel, for the prescriber's own orders. */
  actions?: { onRevise: (order: OrderSummary) => void; onCancel: (order: OrderSummary) => void };
}

const column = createColumnHelper<OrderSummary>();

function StatusCell({ order }: { order: OrderSummary & Partial<Pick<OrderListEntry, 'paused'>> }) {
  return (
    <Stack gap={4} align="flex-start" miw={190}>
      <OrderStatusBadge status={order.status} />
      {order.paused ? <PausedBadge size="md" /> : null}
      {order.status === 'returned' && order.statusReason ? (
        <Group gap={4} wrap="nowrap" align="flex-start" maw={320}>
          <IconArrowBackUp size={14} aria-hidden style={{ marginTop: 3, flex: 'none' }} />
          <Text size="xs" data-testid="pharmacist-query">
            Query: {order.statusReason}
          </Text>
        </Group>
      ) : null}
    </Stack>
  );
}

/** PCA orders, newest first, with status (icon and word), the regimen in safe format and when signed. */
export function OrdersTable({ orders, label, isLoading, empty, showPatient, onOpen, actions }: OrdersTableProps) {
  const [sorting, setSorting] = useState<SortingState>([{ id: 'signedAt', desc: true }]);
  const columns = useMemo(
    () => [
      column.accessor('id', {
        header: 'Order',
        cell: ({ row }) => (
          <Anchor component={Link} to={paths.order.getHref(row.original.id)} tabIndex={-1} size="sm" fw={500}>
            {row.original.id}
            {row.original.version > 1 ? ` (v${row.original.version})` : ''}
          </Anchor>
        ),
      }),
      column.accessor('status', { header: 'Status', cell: ({ row }) => <StatusCell order={row.original} /> }),
      ...(showPatient
        ? [
            column.accessor('patientName', {
              header: 'Patient',
              cell: ({ row }) => (
                <div>
                  <Text size="sm" fw={500}>
                    {row.original.patientName}
                  </Text>
                  <Text size="xs" c="dimmed">
                    MRN {row.original.patientMrn} · {row.original.wardName}, bed {row.original.bed}
                  </Text>
                </div>
              ),
            }),
          ]
        : []),
      column.accessor((order) => formatRegimen(order), { id: 'regimen', header: 'Regimen', enableSorting: false }),
      ...(showPatient ? [] : [column.accessor('prescriberName', { header: 'Prescriber' })]),
      column.accessor('signedAt', {
        header: 'Signed',
        cell: ({ getValue }) => (
          <Text span size="sm" style={{ whiteSpace: 'nowrap' }}>
            {formatDateTime(getValue())}
          </Text>
        ),
      }),
      ...(actions
        ? [
            column.display({
              id: 'actions',
              header: 'Actions',
              cell: ({ row }) => {
                const order = row.original;
                const describe = `order ${order.id}`;
                return (
                  <Group gap={6} wrap="nowrap" onClick={(event) => event.stopPropagation()} onKeyDown={(event) => event.stopPropagation()}>
                    {order.status === 'returned' ? (
                      <Button
                        size="xs"
                        leftSection={<IconPencil size={14} aria-hidden />}
                        onClick={() => actions.onRevise(order)}
                        aria-label={`Revise ${describe}`}
                      >
                        Revise
                      </Button>
                    ) : null}
                    {canCancel(order.status) ? (
                      <Button
                        size="xs"
                        variant="default"
                        leftSection={<IconSquareX size={14} aria-hidden />}
                        onClick={() => actions.onCancel(order)}
                        aria-label={`Cancel ${describe}`}
                      >
                        Cancel
                      </Button>
                    ) : null}
                  </Group>
                );
              },
            }),
          ]
        : []),
    ],
    [showPatient, actions],
  );
  const table = useReactTable({
    data: orders,
    columns,
    state: { sorting },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getRowId: (order) => String(order.id),
  });
  return (
    <DataTable
      table={table}
      label={label}
      isLoading={isLoading}
      onRowOpen={onOpen}
      skeletonRows={3}
      empty={<EmptyState size="sm" icon={<IconClipboardList aria-hidden />} title="No orders" description={empty} />}
    />
  );
}
