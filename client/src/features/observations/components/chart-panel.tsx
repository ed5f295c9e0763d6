import { useState, type ReactNode } from 'react';
import { Button, Collapse, Group, Paper, Text, Title } from '@mantine/core';
import { IconTable } from '@tabler/icons-react';

export interface ChartPanelProps {
  /** A stable id for the panel's parts (title, summary, table). */
  id: string;
  title: string;
  /** The chart in a sentence or two: its text alternative, always shown. */
  summary: string;
  /** The same figures as a table, shown on request. */
  table: ReactNode;
  children: ReactNode;
}

/**
 * A chart as a named figure: a title, a summary in words, the chart, and its figures as a
 * table for anyone who would rather read than look (or cannot see the chart).
 */
export function ChartPanel({ id, title, summary, table, children }: ChartPanelProps) {
  const [showTable, setShowTable] = useState(false);
  return (
    <Paper
      withBorder
      radius="md"
      p="md"
      component="figure"
      m={0}
      aria-labelledby={`${id}-title`}
      aria-describedby={`${id}-summary`}
      data-chart={id}
    >
      <Group justify="space-between" align="flex-start" wrap="wrap" gap="xs">
        <Title order={3} id={`${id}-title`}>
          {title}
        </Title>
        <Button
          variant="subtle"
          size="compact-sm"
          leftSection={<IconTable size={16} aria-hidden />}
          onClick={() => setShowTable((shown) => !shown)}
          aria-expanded={showTable}
          aria-controls={`${id}-table`}
        >
          {showTable ? 'Hide table' : 'Show as table'}
        </Button>
      </Group>
      <Text component="figcaption" size="sm" c="dimmed" id={`${id}-summary`} mb="sm" className="tabular-nums">
        {summary}
      </Text>
      {children}
      <Collapse expanded={showTable} id={`${id}-table`} keepMounted={false}>
        <div style={{ marginTop: 'var(--mantine-spacing-sm)' }}>{table}</div>
      </Collapse>
    </Paper>
  );
}
