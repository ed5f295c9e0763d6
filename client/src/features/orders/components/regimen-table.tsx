import { Badge, Group, Table, Text } from '@mantine/core';
import { IconCircleCheck, IconPencil } from '@tabler/icons-react';
import type { FindingSeverity, OrderDetail, OrderSummary } from '@lockstep/shared';
import { regimenRows, type RegimenRow } from '../utils/regimen-rows';
import { SEVERITY_LOOK } from './finding-line';

export interface RegimenTableProps {
  order: OrderDetail;
  /** The version this one revises: its values are shown and changes marked. */
  previous: OrderSummary | null;
  weightKg: number | null;
  caption: string;
}

function Severity({ severity }: { severity: FindingSeverity }) {
  const { word, color, Icon } = SEVERITY_LOOK[severity];
  return (
    <Group gap={4} wrap="nowrap">
      <Icon size={16} color={`var(--mantine-color-${color}-7)`} aria-hidden />
      <Text size="sm" fw={600} c={`${color}.8`}>
        {word}
      </Text>
    </Group>
  );
}

function Fine({ children }: { children: string }) {
  return (
    <Group gap={4} wrap="nowrap">
      <IconCircleCheck size={16} color="var(--mantine-color-teal-7)" aria-hidden />
      <Text size="sm">{children}</Text>
    </Group>
  );
}

/** The row's worst finding; otherwise "Within limits", or "In the library" for the concentration. */
function CheckCell({ row, hasRule }: { row: RegimenRow; hasRule: boolean }) {
  if (row.worst) return <Severity severity={row.worst} />;
  if (row.field === 'concentrationPerMl' && hasRule) return <Fine>In the library</Fine>;
  if (row.limited && row.set && (row.soft || row.hard)) return <Fine>Within limits</Fine>;
  return <Dash />;
}

function Dash() {
  return (
    <Text span size="sm" c="dimmed">
      —
    </Text>
  );
}

/** The order field by field beside the limit rule it was signed against (and its previous version). */
export function RegimenTable({ order, previous, weightKg, caption }: RegimenTableProps) {
  const rows = regimenRows(order, previous, weightKg);
  const perKg = Boolean(order.rule?.perKg);
  return (
    <Table.ScrollContainer minWidth={640}>
      <Table tabularNums verticalSpacing={8} captionSide="top" aria-label={caption}>
        <Table.Thead>
          <Table.Tr>
            <Table.Th>Parameter</Table.Th>
            <Table.Th>Ordered</Table.Th>
            {perKg ? <Table.Th>Per kg</Table.Th> : null}
            <Table.Th>Soft limits</Table.Th>
            <Table.Th>Hard limits</Table.Th>
            {previous ? <Table.Th>Version {previous.version}</Table.Th> : null}
            <Table.Th>Check</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {rows.map((row) => (
            <Table.Tr
              key={row.field}
              data-changed={row.changed || undefined}
              style={
                row.changed
                  ? { background: 'var(--mantine-color-yellow-0)', boxShadow: 'inset 4px 0 0 var(--mantine-color-yellow-6)' }
                  : undefined
              }
            >
              <Table.Th scope="row" fw={500}>
                <Group gap={6} wrap="nowrap">
                  {row.label}
                  {row.changed ? (
                    <Badge size="xs" color="yellow" variant="filled" c="dark" leftSection={<IconPencil size={10} aria-hidden />}>
                      Changed
                    </Badge>
                  ) : null}
                </Group>
              </Table.Th>
              <Table.Td fw={600}>{row.ordered}</Table.Td>
              {perKg ? <Table.Td>{row.perKg ?? <Dash />}</Table.Td> : null}
              <Table.Td>{row.soft ?? <Dash />}</Table.Td>
              <Table.Td>{row.hard ?? <Dash />}</Table.Td>
              {previous ? <Table.Td c={row.changed ? undefined : 'dimmed'}>{row.previous}</Table.Td> : null}
              <Table.Td>
                <CheckCell row={row} hasRule={order.rule !== null} />
              </Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}
