import { Alert, Divider, Paper, Stack, Text, Title } from '@mantine/core';
import { IconInfoCircle } from '@tabler/icons-react';
import { DECISION_SUPPORT_CAUTION, type DoseUnit, type Finding, type LimitRuleResponse } from '@lockstep/shared';
import type { OrderCheck } from '../hooks/use-order-check';
import { countBySeverity } from '../utils/findings';
import { possibleTotalRows } from '../utils/possible-total-rows';
import { DerivedValues } from './derived-values';
import { FindingLine } from './finding-line';
import { PossibleTotals } from './possible-totals';
import { ServerCheckStatus } from './server-check-status';

function findingsSummary(findings: readonly Finding[]): string {
  if (findings.length === 0) return 'No findings: every value is inside its limits.';
  const counts = countBySeverity(findings);
  const parts = [
    counts.error + counts.hard > 0 ? `${counts.error + counts.hard} blocking` : null,
    counts.soft > 0 ? `${counts.soft} outside a soft limit` : null,
    counts.caution > 0 ? `${counts.caution} ${counts.caution === 1 ? 'caution' : 'cautions'}` : null,
  ].filter(Boolean);
  return `${findings.length} ${findings.length === 1 ? 'finding' : 'findings'}: ${parts.join(', ')}.`;
}

export interface OrderCheckPanelProps {
  check: OrderCheck;
  doseUnit: DoseUnit | null;
  /** The chosen limit rule, whose 1-hour and 4-hour maxima stand beside what the pump could give. */
  rule?: LimitRuleResponse | null;
  /** The patient's weight, for a per-kg rule. */
  weightKg?: number | null;
}

/** The side panel of the order form: what the regimen means, and every finding, as it is typed. */
export function OrderCheckPanel({ check, doseUnit, rule = null, weightKg = null }: OrderCheckPanelProps) {
  const totals = possibleTotalRows(check.fields, rule, weightKg);
  return (
    <Paper withBorder radius="md" p="md" component="aside" aria-labelledby="order-check-title">
      <Stack gap="sm">
        <Title order={2} id="order-check-title">
          Live check
        </Title>
        <ServerCheckStatus status={check.server} />
        {check.derived && doseUnit ? (
          <DerivedValues derived={check.derived} doseUnit={doseUnit} />
        ) : (
          <Text size="sm" c="dimmed">
            Choose the drug and concentration, or a standard order set, to see the volumes and maximum doses.
          </Text>
        )}
        {totals.length > 0 ? (
          <>
            <Title order={3}>What the pump could give</Title>
            <Text size="xs" c="dimmed">
              Demand doses as often as the lockout allows, the basal rate, one clinician bolus, and the loading dose in the first hour and
              first 4 hours, held by the order&apos;s own limits.
            </Text>
            <PossibleTotals rows={totals} />
          </>
        ) : null}
        <Divider />
        <Title order={3}>Findings</Title>
        <Text size="sm" aria-live="polite" data-testid="findings-summary">
          {check.derived ? findingsSummary(check.findings) : 'Nothing to check yet.'}
        </Text>
        <Stack gap={8}>
          {check.findings.map((finding) => (
            <FindingLine key={`${finding.field}-${finding.code}`} finding={finding} withEffect />
          ))}
        </Stack>
        <Alert color="blue" variant="light" icon={<IconInfoCircle aria-hidden />} p="xs">
          <Text size="xs">{DECISION_SUPPORT_CAUTION}</Text>
        </Alert>
      </Stack>
    </Paper>
  );
}
