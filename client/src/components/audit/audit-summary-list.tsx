import { DataList, Text } from '@mantine/core';
import { summaryFacts } from './audit-summary';

/** What an event recorded, one label and value a line; "from → to" for a change. */
export function AuditSummaryList({ summary }: { summary: Record<string, unknown> }) {
  const facts = summaryFacts(summary);
  if (facts.length === 0) {
    return (
      <Text size="sm" c="dimmed">
        No further details recorded.
      </Text>
    );
  }
  return (
    <DataList size="sm" gap={4} labelWidth="11rem" className="tabular-nums">
      {facts.map((fact, index) => (
        <DataList.Item key={`${fact.label}-${index}`}>
          <DataList.ItemLabel c="dimmed">{fact.label}</DataList.ItemLabel>
          <DataList.ItemValue style={{ overflowWrap: 'anywhere' }}>{fact.value}</DataList.ItemValue>
        </DataList.Item>
      ))}
    </DataList>
  );
}
