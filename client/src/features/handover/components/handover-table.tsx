import { Table, Text } from '@mantine/core';
import type { HandoverRow, SignoffRole } from '@lockstep/shared';
import { rowSeverity } from '../utils/board-filters';
import { BOARD_COLUMNS, ColumnHeader } from './board-columns';
import classes from './handover.module.css';

export interface HandoverTableProps {
  rows: readonly HandoverRow[];
  /** When the board was generated: "waiting since" is measured to it. */
  now: Date;
  empty: string;
  onSignOff?: (row: HandoverRow, role: SignoffRole) => void;
}

/** Every PCA on the ward, in the server's risk order; one dense row each. */
export function HandoverTable({ rows, now, empty, onSignOff }: HandoverTableProps) {
  return (
    // The scrolling region takes keyboard focus, so the board can be scrolled without a mouse.
    <Table.ScrollContainer
      minWidth={1080}
      maxHeight="calc(100dvh - 230px)"
      type="native"
      tabIndex={0}
      role="region"
      aria-label="Handover board, scrollable"
    >
      <Table aria-label="Handover board" className={classes.table} stickyHeader tabularNums verticalSpacing={6} horizontalSpacing={8}>
        <Table.Thead>
          <Table.Tr>
            {BOARD_COLUMNS.map((column) => (
              <Table.Th key={column.header} scope="col">
                <ColumnHeader column={column} />
              </Table.Th>
            ))}
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {rows.map((row) => (
            <Table.Tr key={row.orderId} className={classes.row} data-severity={rowSeverity(row)}>
              {BOARD_COLUMNS.map((column) => (
                <Table.Td key={column.header}>{column.cell(row, { now, onSignOff })}</Table.Td>
              ))}
            </Table.Tr>
          ))}
          {rows.length === 0 ? (
            <Table.Tr>
              <Table.Td colSpan={BOARD_COLUMNS.length}>
                <Text size="sm" c="dimmed" py="sm">
                  {empty}
                </Text>
              </Table.Td>
            </Table.Tr>
          ) : null}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}
