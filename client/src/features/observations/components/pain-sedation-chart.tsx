import { LineChart } from '@mantine/charts';
import { Center, Paper, Table, Text } from '@mantine/core';
import { SEDATION_DESCRIPTIONS, type ObservationResponse } from '@lockstep/shared';
import { painAndSedation, painAndSedationSummary, type ObservationPoint } from '../utils/chart-data';
import { formatClock } from '@/utils/clock';
import { sedationTick } from '../utils/sedation';
import { ChartPanel } from './chart-panel';

const TITLE = 'Pain score and sedation level';

function PointTooltip({ point }: { point: ObservationPoint | undefined }) {
  if (!point) return null;
  return (
    <Paper withBorder shadow="sm" p="xs" radius="sm" className="tabular-nums">
      <Text size="sm" fw={600}>
        {point.time}
      </Text>
      <Text size="sm">Pain {point.pain}/10</Text>
      <Text size="sm">
        Sedation {point.sedationLevel}: {SEDATION_DESCRIPTIONS[point.sedationLevel]}
      </Text>
    </Paper>
  );
}

/** Pain (0–10, left axis) and sedation (S, 1–4, right axis; S drawn as 0) at each observation. */
export function PainSedationChart({
  observations,
  window,
}: {
  observations: readonly ObservationResponse[];
  window: { start: string; end: string } | null;
}) {
  const points = painAndSedation(observations, window);
  const summary = painAndSedationSummary(points);
  const table = (
    <Table striped withTableBorder>
      <Table.Caption>{TITLE}</Table.Caption>
      <Table.Thead>
        <Table.Tr>
          <Table.Th scope="col">Time</Table.Th>
          <Table.Th scope="col">Pain (0–10)</Table.Th>
          <Table.Th scope="col">Sedation</Table.Th>
        </Table.Tr>
      </Table.Thead>
      <Table.Tbody>
        {points.map((point) => (
          <Table.Tr key={point.at}>
            <Table.Th scope="row" fw={400}>
              {point.time}
            </Table.Th>
            <Table.Td>{point.pain}</Table.Td>
            <Table.Td>
              {point.sedationLevel}: {SEDATION_DESCRIPTIONS[point.sedationLevel]}
            </Table.Td>
          </Table.Tr>
        ))}
      </Table.Tbody>
    </Table>
  );
  return (
    <ChartPanel id="chart-pain-sedation" title={TITLE} summary={summary} table={table}>
      {points.length === 0 ? (
        <Center h={240} bg="var(--mantine-color-gray-0)" style={{ borderRadius: 'var(--mantine-radius-sm)' }}>
          <Text c="dimmed">Nothing to draw yet: the first observation starts the chart.</Text>
        </Center>
      ) : (
        <LineChart
          h={240}
          data={points}
          dataKey="at"
          series={[
            { name: 'pain', label: 'Pain score', color: 'orange.8' },
            { name: 'sedation', label: 'Sedation level', color: 'grape.7', yAxisId: 'right', strokeDasharray: '6 3' },
          ]}
          curveType="linear"
          withLegend
          legendProps={{ verticalAlign: 'bottom', height: 40 }}
          withRightYAxis
          yAxisLabel="Pain"
          rightYAxisLabel="Sedation"
          xAxisProps={{ tickFormatter: (value: string) => formatClock(value), padding: { left: 28, right: 28 } }}
          yAxisProps={{ domain: [0, 10], ticks: [0, 2, 4, 6, 8, 10], allowDecimals: false, width: 40 }}
          rightYAxisProps={{ domain: [0, 4], ticks: [0, 1, 2, 3, 4], tickFormatter: (value: number) => sedationTick(value), width: 40 }}
          referenceLines={[{ y: 3, yAxisId: 'right', color: 'red.7', label: 'Sedation 3: unacceptable', labelPosition: 'insideTopRight' }]}
          lineProps={(series) => ({
            label: {
              position: 'top',
              offset: 8,
              fontSize: 12,
              formatter: (value) => (series.name === 'sedation' ? sedationTick(Number(value)) : String(value ?? '')),
            },
          })}
          tooltipProps={{ content: ({ payload }) => <PointTooltip point={payload?.[0]?.payload as ObservationPoint | undefined} /> }}
          lineChartProps={{ title: TITLE, desc: summary, margin: { top: 20, right: 10, left: 10, bottom: 0 } }}
        />
      )}
    </ChartPanel>
  );
}
