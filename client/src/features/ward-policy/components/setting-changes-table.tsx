import { Table, Text } from '@mantine/core';
import type { SettingChangeRow } from '../utils/policy-change';

export interface SettingChangesTableProps {
  rows: readonly SettingChangeRow[];
  /** The table's accessible name. */
  label: string;
  /** Adds the shipped default beside each setting, for the approver's review. */
  withDefaults?: boolean;
}

/** Each setting of a ward policy change, from → to with its unit (and the shipped default beside it). */
export function SettingChangesTable({ rows, label, withDefaults = false }: SettingChangesTableProps) {
  return (
    <Table aria-label={label} withTableBorder verticalSpacing={6} fz="sm">
      <Table.Thead>
        <Table.Tr>
          <Table.Th scope="col">Setting</Table.Th>
          <Table.Th scope="col">Now</Table.Th>
          <Table.Th scope="col">Proposed</Table.Th>
          {withDefaults ? <Table.Th scope="col">Shipped default</Table.Th> : null}
        </Table.Tr>
      </Table.Thead>
      <Table.Tbody>
        {rows.map((row) => (
          <Table.Tr key={row.field} data-setting={row.field}>
            <Table.Th scope="row" fw={500}>
              {row.label}
            </Table.Th>
            <Table.Td className="tabular-nums">{row.from}</Table.Td>
            <Table.Td className="tabular-nums" fw={600}>
              <Text span size="sm" c="dimmed" aria-hidden>
                →{' '}
              </Text>
              {row.to}
            </Table.Td>
            {withDefaults ? (
              <Table.Td className="tabular-nums" c="dimmed">
                {row.shippedDefault ?? 'None shipped'}
              </Table.Td>
            ) : null}
          </Table.Tr>
        ))}
      </Table.Tbody>
    </Table>
  );
}
