import { Anchor, Button, Group, Skeleton, Stack, Text } from '@mantine/core';
import { IconArrowLeft, IconPrinter } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { QueryErrorAlert } from '@/components/errors/query-error-alert';
import { paths } from '@/config/paths';
import { formatClockSeconds } from '@/utils/clock';
import { formatDateTime } from '@/utils/format-date';
import { useHandoverBoard } from '../api/get-handover-board';
import { signoffProgress, signoffProgressText } from '../utils/board-filters';
import { formatShift } from '../utils/board-format';
import classes from './handover-print.module.css';
import { PrintTable } from './print-table';

export interface HandoverPrintScreenProps {
  wardId: number;
  /** The signed-in person, named on the sheet as the one who printed it. */
  printedBy: string;
}

/** The printable handover sheet of one ward: A4 landscape, black and white, every PCA. */
export function HandoverPrintScreen({ wardId, printedBy }: HandoverPrintScreenProps) {
  const board = useHandoverBoard(wardId);
  const controls = (
    <Group justify="space-between" className={classes.noPrint} mb="sm">
      <Anchor component={Link} to={paths.handover.getHref(wardId)} size="sm">
        <Group gap={4} component="span">
          <IconArrowLeft size={16} aria-hidden />
          Back to the board
        </Group>
      </Anchor>
      <Button leftSection={<IconPrinter size={16} aria-hidden />} onClick={() => window.print()} disabled={!board.data}>
        Print
      </Button>
    </Group>
  );

  if (board.isError) {
    return (
      <Stack gap="sm">
        {controls}
        <QueryErrorAlert title="The handover sheet could not be loaded" error={board.error} onRetry={() => void board.refetch()} />
      </Stack>
    );
  }
  if (!board.data) {
    return (
      <Stack gap="sm">
        {controls}
        <Skeleton height={320} aria-label="Loading the handover sheet" />
      </Stack>
    );
  }

  const { data } = board;
  const printedAt = new Date().toISOString();
  return (
    <div>
      {controls}
      <article className={classes.sheet} aria-labelledby="handover-sheet-title">
        <h1 id="handover-sheet-title" className={classes.heading}>
          Handover sheet: {data.wardName}
        </h1>
        <Text component="p" className={classes.meta} data-testid="sheet-meta">
          {formatShift(data.shift)} · Printed {formatDateTime(printedAt)} by {printedBy} · Board as of{' '}
          {formatClockSeconds(data.generatedAt)} · {data.rows.length} {data.rows.length === 1 ? 'PCA' : 'PCAs'} ·{' '}
          {signoffProgressText(signoffProgress(data.rows))}
        </Text>
        <PrintTable rows={data.rows} now={new Date(data.generatedAt)} />
      </article>
    </div>
  );
}
