import { Stack, Text } from '@mantine/core';
import type { Finding, Override } from '@lockstep/shared';
import { FindingLine } from './finding-line';

export interface OrderFindingsProps {
  findings: Finding[];
  overrides: Override[];
}

/** What the check found when the order was signed, with the prescriber's reason beside each soft finding. */
export function OrderFindings({ findings, overrides }: OrderFindingsProps) {
  if (findings.length === 0) {
    return (
      <Text size="sm" c="dimmed">
        No findings: every value was inside its limits when the order was signed.
      </Text>
    );
  }
  return (
    <Stack gap={8}>
      {findings.map((finding) => (
        <FindingLine
          key={`${finding.field}-${finding.code}`}
          finding={finding}
          reason={finding.severity === 'soft' ? overrides.find((override) => override.field === finding.field)?.reason : undefined}
        />
      ))}
    </Stack>
  );
}
