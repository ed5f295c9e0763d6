import { useMemo, useState } from 'react';
import { Group, Select, Skeleton, Stack, Text, Title } from '@mantine/core';
import { useSearchParams } from 'react-router-dom';
import type { HandoverRow, SignoffRole, Ward } from '@lockstep/shared';
import { QueryErrorAlert } from '@/components/errors/query-error-alert';
import { paths } from '@/config/paths';
import { wardKindLabel } from '@/utils/ward-kind';
import { useHandoverBoard } from '../api/get-handover-board';
import { useWardStream } from '../hooks/use-ward-stream';
import { useWardParam } from '../hooks/use-ward-param';
import { filterRows, NO_FILTERS, signoffProgress, type BoardFilters } from '../utils/board-filters';
import { formatShift } from '../utils/board-format';
import { BoardToolbar } from './board-toolbar';
import { HandoverTable } from './handover-table';
import { LiveIndicator } from './live-indicator';
import { SignoffModal } from './signoff-modal';

export interface HandoverScreenProps {
  wards: Ward[];
  wardsLoading: boolean;
  /** Nurses and charge nurses sign off; prescribers and pharmacists read the board. */
  canSignOff: boolean;
}

/** The charge nurse's live handover board for one ward. */
export function HandoverScreen({ wards, wardsLoading, canSignOff }: HandoverScreenProps) {
  const [, setSearchParams] = useSearchParams();
  const wardId = useWardParam(wards);
  const board = useHandoverBoard(wardId);
  const streamStatus = useWardStream(wardId);
  const [filters, setFilters] = useState<BoardFilters>(NO_FILTERS);
  const [signing, setSigning] = useState<{ orderId: number; role: SignoffRole } | null>(null);

  const rows = useMemo(() => board.data?.rows ?? [], [board.data]);
  const kind = wardKindLabel(wards.find((ward) => ward.id === board.data?.wardId));
  const shown = useMemo(() => filterRows(rows, filters), [rows, filters]);
  // The open modal follows the row as the board refreshes underneath it.
  const signingRow: HandoverRow | undefined = signing ? rows.find((row) => row.orderId === signing.orderId) : undefined;

  const chooseWard = (value: string | null) => {
    if (!value) return;
    setSearchParams({ ward: value }, { replace: true });
    setSigning(null);
  };

  const empty =
    rows.length === 0
      ? 'No PCA on this ward is awaiting verification, verified or running.'
      : 'No PCA matches these filters. Clear a filter to see every PCA.';

  return (
    <Stack gap="sm">
      <Group justify="space-between" align="flex-end" wrap="wrap" gap="sm">
        <Stack gap={2}>
          <Title order={1}>Handover</Title>
          {board.data ? (
            <Text size="sm" c="dimmed" data-testid="board-shift">
              {board.data.wardName}
              {kind ? ` · ${kind}` : ''} · {formatShift(board.data.shift)}
            </Text>
          ) : (
            <Skeleton height={18} width={260} />
          )}
        </Stack>
        <Group gap="lg" align="flex-end" wrap="wrap">
          <LiveIndicator status={streamStatus} updatedAt={board.data?.generatedAt ?? null} />
          <Select
            label="Ward"
            data={wards.map((ward) => ({ value: String(ward.id), label: ward.name }))}
            value={wardId === null ? null : String(wardId)}
            onChange={chooseWard}
            allowDeselect={false}
            disabled={wardsLoading}
            w={200}
          />
        </Group>
      </Group>
      {!wardsLoading && wards.length === 0 ? (
        <Text size="sm">No wards are set up yet. An admin adds wards before a board can show.</Text>
      ) : board.isError ? (
        <QueryErrorAlert title="The handover board could not be loaded" error={board.error} onRetry={() => void board.refetch()} />
      ) : board.data ? (
        <>
          <BoardToolbar
            filters={filters}
            onFiltersChange={setFilters}
            progress={signoffProgress(rows)}
            shownCount={shown.length}
            totalCount={rows.length}
            printHref={paths.handoverPrint.getHref(board.data.wardId)}
          />
          <HandoverTable
            rows={shown}
            now={new Date(board.data.generatedAt)}
            empty={empty}
            onSignOff={canSignOff ? (row, role) => setSigning({ orderId: row.orderId, role }) : undefined}
          />
        </>
      ) : (
        <Skeleton height={240} aria-label="Loading the handover board" />
      )}
      {signing && signingRow && wardId !== null ? (
        <SignoffModal
          key={`${signing.orderId}-${signing.role}`}
          wardId={wardId}
          row={signingRow}
          role={signing.role}
          onClose={() => setSigning(null)}
        />
      ) : null}
    </Stack>
  );
}
