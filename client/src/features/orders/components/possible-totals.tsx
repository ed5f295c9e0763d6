import type { ComponentType } from 'react';
import { Group, Table, Text, ThemeIcon } from '@mantine/core';
import { IconAlertTriangle, IconBan, IconCircleCheck, IconMinus, type IconProps } from '@tabler/icons-react';
import type { PossibleTotalRow, PossibleTotalStatus } from '../utils/possible-total-rows';

type StatusLook = { word: string; color: string; Icon: ComponentType<IconProps> };

/** Icon, word and colour for each status: never colour alone. */
export const POSSIBLE_TOTAL_LOOK: Record<PossibleTotalStatus, StatusLook> = {
  'over-hard': { word: 'Over hard maximum', color: 'red', Icon: IconBan },
  'over-soft': { word: 'Over soft maximum', color: 'orange', Icon: IconAlertTriangle },
  within: { word: 'Within', color: 'green', Icon: IconCircleCheck },
  'no-limit': { word: 'Not limited by the rule', color: 'gray', Icon: IconMinus },
};

export interface PossibleTotalsProps {
  rows: readonly PossibleTotalRow[];
}

/** What the pump could give in the first hour, any other hour, the first 4 hours and any other 4 hours, beside the rule's maxima. */
export function PossibleTotals({ rows }: PossibleTotalsProps) {
  return (
    <Table className="tabular-nums" verticalSpacing={4} horizontalSpacing={6} fz="sm" aria-label="What the pump could give">
      <Table.Thead>
        <Table.Tr>
          <Table.Th>Window</Table.Th>
          <Table.Th>Could give</Table.Th>
          <Table.Th>Rule maximum</Table.Th>
        </Table.Tr>
      </Table.Thead>
      <Table.Tbody>
        {rows.map((row) => {
          const { word, color, Icon } = POSSIBLE_TOTAL_LOOK[row.status];
          return (
            <Table.Tr key={row.window} data-status={row.status}>
              <Table.Td>{row.label}</Table.Td>
              <Table.Td fw={600}>{row.total}</Table.Td>
              <Table.Td>
                <Text size="sm">{row.limit}</Text>
                <Group gap={4} wrap="nowrap">
                  <ThemeIcon size={18} variant="light" color={color} radius="xl" aria-hidden>
                    <Icon size={12} />
                  </ThemeIcon>
                  <Text span size="xs" fw={600} c={`${color}.8`}>
                    {word}
                  </Text>
                </Group>
              </Table.Td>
            </Table.Tr>
          );
        })}
      </Table.Tbody>
    </Table>
  );
}
