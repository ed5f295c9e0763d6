import { BarChart } from '@mantine/charts';
import { Table } from '@mantine/core';
import type { UsageBucket } from '@lockstep/shared';
import { attemptsPerHour, attemptsSummary } from '../utils/chart-data';
import { ChartPanel } from './chart-panel';

const TITLE = 'Attempts and doses delivered per hour';

/** Presses of the button against doses the pump gave: a gap says the pain is not controlled. */
export function AttemptsChart({ buckets }: { buckets: readonly UsageBucket[] }) {
  const bars = attemptsPerHour(buckets);
  const summary = attemptsSummary(bars);
  const table = (
    <Table striped withTableBorder>
      <Table.Caption>{TITLE}</Table.Caption>
      <Table.Thead>
        <Table.Tr>
          <Table.Th scope="col">Hour from</Table.Th>
          <Table.Th scope="col">Attempts</Table.Th>
          <Table.Th scope="col">Delivered</Table.Th>
        </Table.Tr>
      </Table.Thead>
      <Table.Tbody>
        {bars.map((bar) => (
          <Table.Tr key={bar.start}>
            <Table.Th scope="row" fw={400}>
              {bar.hour}
            </Table.Th>
            <Table.Td>{bar.attempts}</Table.Td>
            <Table.Td>{bar.delivered}</Table.Td>
          </Table.Tr>
        ))}
      </Table.Tbody>
    </Table>
  );
  return (
    <ChartPanel id="chart-attempts" title={TITLE} summary={summary} table={table}>
      <BarChart
        h={220}
        data={bars}
        dataKey="hour"
        series={[
          { name: 'attempts', label: 'Attempts', color: 'slate.4' },
          { name: 'delivered', label: 'Delivered', color: 'lagoon.7' },
        ]}
        withLegend
        legendProps={{ verticalAlign: 'bottom', height: 40 }}
        // At least 0–4, so an hour of no use does not draw a scale of fractions.
        yAxisProps={{ allowDecimals: false, width: 40, domain: [0, (max: number) => Math.max(4, max)] }}
        xAxisLabel="Hour from"
        maxBarWidth={28}
        barChartProps={{ title: TITLE, desc: summary }}
      />
    </ChartPanel>
  );
}
