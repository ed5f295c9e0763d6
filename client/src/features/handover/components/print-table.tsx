import { DECISION_SUPPORT_CAUTION, LOCAL_POLICY_CAUTION, type HandoverRow } from '@lockstep/shared';
import { rowSeverity } from '../utils/board-filters';
import { BOARD_COLUMNS, ColumnHeader } from './board-columns';
import classes from './handover-print.module.css';

export interface PrintTableProps {
  rows: readonly HandoverRow[];
  now: Date;
}

/**
 * The board on paper: the same cells as the screen, no actions, and a Notes column to write in.
 * The header repeats on every page, and so does the caution (a table footer prints on each page).
 */
export function PrintTable({ rows, now }: PrintTableProps) {
  const columnCount = BOARD_COLUMNS.length + 1;
  return (
    <table className={classes.table} aria-label="Handover sheet">
      <thead>
        <tr>
          {BOARD_COLUMNS.map((column) => (
            <th key={column.header} scope="col">
              <ColumnHeader column={column} />
            </th>
          ))}
          <th scope="col" className={classes.notes}>
            Notes
          </th>
        </tr>
      </thead>
      <tbody>
        {rows.map((row) => (
          <tr key={row.orderId} data-severity={rowSeverity(row)}>
            {BOARD_COLUMNS.map((column) => (
              <td key={column.header}>{column.cell(row, { now })}</td>
            ))}
            <td />
          </tr>
        ))}
        {rows.length === 0 ? (
          <tr>
            <td colSpan={columnCount}>No PCA on this ward is awaiting verification, verified or running.</td>
          </tr>
        ) : null}
      </tbody>
      <tfoot>
        <tr>
          <td colSpan={columnCount} className={classes.caution}>
            {DECISION_SUPPORT_CAUTION} {LOCAL_POLICY_CAUTION}
          </td>
        </tr>
      </tfoot>
    </table>
  );
}
