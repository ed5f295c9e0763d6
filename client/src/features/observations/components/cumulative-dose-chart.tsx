import { LineChart } from '@mantine/charts';
import { Table } from '@mantine/core';
import { formatDose, normaliseUnit, type UsageBucket } from '@lockstep/shared';
import { cumulativeDose, cumulativeSummary } from '../utils/chart-data';
import { formatClock } from '@/utils/clock';
import { ChartPanel } from './chart-panel';

const TITLE = 'Cumulative dose';

/** The dose given over the window, PCA doses and clinician boluses together, as a running total. */
export function CumulativeDoseChart({ buckets, doseUnit }: { buckets: readonly UsageBucket[]; doseUnit: string }) {
  const points = cumulativeDose(buckets);
  const summary = cumulativeSummary(points, doseUnit);
  const format = (value: number) => formatDose(value, doseUnit);
  const table = (
    <Table striped withTableBorder>
      <Table.Caption>{TITLE}</Table.Caption>
      <Table.Thead>
        <Table.Tr>
          <Table.Th scope="col">By</Table.Th>
          <Table.Th scope="col">Given in the hour before</Table.Th>
          <Table.Th scope="col">Running total</Table.Th>
        </Table.Tr>
      </Table.Thead>
      <Table.Tbody>
        {points.slice(1).map((point) => (
          <Table.Tr key={point.at}>
            <Table.Th scope="row" fw={400}>
              {point.time}
            </Table.Th>
            <Table.Td>{format(point.dose)}</Table.Td>
            <Table.Td>{format(point.cumulative)}</Table.Td>
          </Table.Tr>
        ))}
      </Table.Tbody>
    </Table>
  );
  return (
    <ChartPanel id="chart-cumulative" title={`${TITLE} (${normaliseUnit(doseUnit)})`} summary={summary} table={table}>
      <LineChart
        h={220}
        data={points}
        dataKey="at"
        series={[{ name: 'cumulative', label: 'Running total', color: 'lagoon.7' }]}
        curveType="linear"
        valueFormatter={format}
        yAxisProps={{ width: 64 }}
        // Keyed by the moment: over 24 hours the first and last clock times are the same.
        xAxisProps={{ tickFormatter: (value: string) => formatClock(value) }}
        tooltipProps={{ labelFormatter: (label) => `By ${formatClock(String(label))}` }}
        withDots={false}
        lineChartProps={{ title: TITLE, desc: summary }}
      />
    </ChartPanel>
  );
}
