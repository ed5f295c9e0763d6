import { useMemo, useState } from 'react';
import { Badge, EmptyState, Group, Select, Stack, Text, Title } from '@mantine/core';
import { IconClipboardCheck, IconVersions } from '@tabler/icons-react';
import { createColumnHelper, getCoreRowModel, getSortedRowModel, useReactTable, type SortingState } from '@tanstack/react-table';
import { useNavigate, useSearchParams } from 'react-router-dom';
import { formatRegimen, type OrderListEntry, type Ward } from '@lockstep/shared';
import { QueryErrorAlert } from '@/components/errors/query-error-alert';
import { DataTable } from '@/components/ui/data-table';
import { paths } from '@/config/paths';
import { useNow } from '@/hooks/use-now';
import { minutesSince } from '@/utils/clock';
import { formatElapsed } from '@/utils/duration';
import { formatDateTime } from '@/utils/format-date';
import { useOrders } from '@/api/orders/get-orders';
import { OtherOpioidOrdersMark } from './other-opioid-orders';

const ALL_WARDS = 'all';
// Others sign orders all the time: look again twice a minute.
const QUEUE_REFRESH_MS = 30_000;
const AWAITING = ['awaiting_verification'] as const;

const column = createColumnHelper<OrderListEntry>();

export interface VerificationQueueScreenProps {
  wards: Ward[];
  wardsLoading: boolean;
}

/** Pharmacy's queue of orders awaiting verification, oldest first, with how long each has waited. */
export function VerificationQueueScreen({ wards, wardsLoading }: VerificationQueueScreenProps) {
  const navigate = useNavigate();
  const now = useNow(QUEUE_REFRESH_MS);
  const [searchParams, setSearchParams] = useSearchParams();
  const ward = searchParams.get('ward') ?? ALL_WARDS;
  const wardId = ward === ALL_WARDS ? undefined : Number(ward);
  const ordersQuery = useOrders(
    { status: AWAITING, wardId: Number.isInteger(wardId) ? wardId : undefined },
    { refetchInterval: QUEUE_REFRESH_MS },
  );
  const [sorting, setSorting] = useState<SortingState>([{ id: 'waiting', desc: false }]);

  const columns = useMemo(
    () => [
      column.accessor('statusChangedAt', {
        id: 'waiting',
        header: 'Waiting',
        cell: ({ getValue }) => (
          <div>
            <Text size="sm" fw={600}>
              {formatElapsed(minutesSince(getValue(), now))}
            </Text>
            <Text size="xs" c="dimmed">
              since {formatDateTime(getValue())}
            </Text>
          </div>
        ),
      }),
      column.accessor('patientName', {
        header: 'Patient',
        cell: ({ row }) => (
          <div>
            <Text size="sm" fw={500}>
              {row.original.patientName}
            </Text>
            <Text size="xs" c="dimmed">
              MRN {row.original.patientMrn}
            </Text>
            <OtherOpioidOrdersMark others={row.original.otherOpenOrders} />
          </div>
        ),
      }),
      column.accessor((order) => `${order.wardName} ${order.bed}`, {
        id: 'ward',
        header: 'Ward and bed',
        cell: ({ row }) => `${row.original.wardName}, bed ${row.original.bed}`,
      }),
      column.accessor((order) => formatRegimen(order), {
        id: 'regimen',
        header: 'Regimen',
        enableSorting: false,
        cell: ({ row, getValue }) => (
          <Group gap={6} wrap="nowrap">
            <span>{getValue()}</span>
            {row.original.version > 1 ? (
              <Badge size="xs" variant="light" color="grape" leftSection={<IconVersions size={10} aria-hidden />}>
                Revision
              </Badge>
            ) : null}
          </Group>
        ),
      }),
      column.accessor('prescriberName', { header: 'Prescriber' }),
    ],
    [now],
  );
  const table = useReactTable({
    data: ordersQuery.data ?? [],
    columns,
    state: { sorting },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getRowId: (order) => String(order.id),
  });
  const count = ordersQuery.data?.length ?? 0;

  return (
    <Stack gap="md">
      <Title order={1}>Verification</Title>
      <Group align="flex-end" gap="md">
        <Select
          label="Ward"
          data={[{ value: ALL_WARDS, label: 'All wards' }, ...wards.map((w) => ({ value: String(w.id), label: w.name }))]}
          value={ward}
          onChange={(value) => setSearchParams(value && value !== ALL_WARDS ? { ward: value } : {}, { replace: true })}
          allowDeselect={false}
          disabled={wardsLoading}
          w={220}
        />
        <Text size="sm" c="dimmed" pb={8} aria-live="polite">
          {ordersQuery.isPending ? 'Loading…' : `${count} ${count === 1 ? 'order' : 'orders'} awaiting verification, oldest first`}
        </Text>
      </Group>
      {ordersQuery.isError ? (
        <QueryErrorAlert title="The queue could not be loaded" error={ordersQuery.error} onRetry={() => void ordersQuery.refetch()} />
      ) : (
        <DataTable
          table={table}
          label="Orders awaiting verification"
          isLoading={ordersQuery.isPending}
          onRowOpen={(order) => navigate(paths.verification.getHref(order.id))}
          empty={
            <EmptyState
              size="sm"
              icon={<IconClipboardCheck aria-hidden />}
              title="Nothing to verify"
              description="No order is awaiting verification on this ward."
            />
          }
        />
      )}
    </Stack>
  );
}
