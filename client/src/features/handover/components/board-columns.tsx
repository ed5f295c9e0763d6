import type { ReactNode } from 'react';
import type { HandoverRow, SignoffRole } from '@lockstep/shared';
import { BedCell, FlagsCell, LastObservationCell, NextObservationCell, PatientCell, PcaCell, SyringeCell, UsageCell } from './board-cells';
import { SignoffCell, TasksCell } from './status-cells';

export interface CellContext {
  /** When the board was generated: times and "waiting since" are read against it. */
  now: Date;
  onSignOff?: (row: HandoverRow, role: SignoffRole) => void;
}

export interface BoardColumn {
  header: string;
  /** A second header line saying how to read the figures. */
  hint?: string;
  cell: (row: HandoverRow, context: CellContext) => ReactNode;
}

/** The board's columns, left to right, for the live table and the printed sheet alike. */
export const BOARD_COLUMNS: readonly BoardColumn[] = [
  { header: 'Bed', hint: 'risk', cell: (row) => <BedCell row={row} /> },
  { header: 'Patient', cell: (row) => <PatientCell patient={row.patient} orderId={row.orderId} /> },
  { header: 'PCA and regimen', cell: (row, { now }) => <PcaCell row={row} now={now} /> },
  { header: 'Last observation', cell: (row, { now }) => <LastObservationCell observation={row.lastObservation} now={now} /> },
  { header: 'Next observation', cell: (row, { now }) => <NextObservationCell next={row.nextObservation} now={now} /> },
  { header: 'Usage', hint: 'attempts / delivered · dose', cell: (row) => <UsageCell row={row} /> },
  { header: 'Syringe', cell: (row, { now }) => <SyringeCell syringe={row.syringe} now={now} /> },
  { header: 'Open flags', cell: (row) => <FlagsCell flags={row.flags} /> },
  { header: 'Pending tasks', cell: (row, { now }) => <TasksCell tasks={row.pendingTasks} now={now} /> },
  { header: 'Handover sign-off', cell: (row, { onSignOff }) => <SignoffCell row={row} onSignOff={onSignOff} /> },
];

/** A column header: the name, and its reading hint on a second, quieter line. */
export function ColumnHeader({ column }: { column: BoardColumn }) {
  return (
    <>
      {column.header}
      {column.hint ? (
        <>
          <br />
          <span style={{ fontWeight: 400 }}>{column.hint}</span>
        </>
      ) : null}
    </>
  );
}
