import type { ReactNode } from 'react';
import { Button, Group, Paper, Select, Stack, Text, Title } from '@mantine/core';
import { IconListCheck } from '@tabler/icons-react';
import { drugAndConcentration, type Finding, type LimitRuleResponse } from '@lockstep/shared';
import type { AvailableOrderSet } from '../utils/order-sets';
import { ruleLabel } from '../utils/regimen-format';
import { FindingLine } from './finding-line';

export interface DrugSectionProps {
  rules: LimitRuleResponse[];
  sets: AvailableOrderSet[];
  /** Per-kg sets need it; without it they are offered but cannot be used. */
  weightKg: number | null;
  ruleId: string | null;
  ruleError?: ReactNode;
  /** Findings about the drug, concentration or unit. */
  findings: Finding[];
  onRuleChange: (ruleId: string | null) => void;
  onPickSet: (picked: AvailableOrderSet) => void;
}

/** Drug and concentration come only from the ward's active library; a standard set fills the rest. */
export function DrugSection({ rules, sets, weightKg, ruleId, ruleError, findings, onRuleChange, onPickSet }: DrugSectionProps) {
  const options = rules.map((rule) => ({ value: String(rule.id), label: ruleLabel(rule) })).sort((a, b) => a.label.localeCompare(b.label));
  return (
    <Paper withBorder radius="md" p="md">
      <Stack gap="md">
        <Title order={2}>Drug and concentration</Title>
        <Stack gap={6} role="group" aria-labelledby="order-sets-label">
          <Text id="order-sets-label" size="sm" fw={500}>
            Standard order sets
          </Text>
          {sets.length === 0 ? (
            <Text size="sm" c="dimmed">
              No standard order set fits this ward&apos;s dose-limit library. Enter the regimen below.
            </Text>
          ) : (
            <Group gap="xs">
              {sets.map((available) => {
                const { set, rule } = available;
                const noWeight = set.perKg && (weightKg === null || weightKg <= 0);
                return (
                  <Button
                    key={set.id}
                    variant="default"
                    size="md"
                    leftSection={<IconListCheck size={18} aria-hidden />}
                    disabled={noWeight}
                    onClick={() => onPickSet(available)}
                    title={noWeight ? "Needs the patient's weight" : undefined}
                  >
                    {set.label}, {drugAndConcentration(rule)}
                  </Button>
                );
              })}
            </Group>
          )}
          <Text size="xs" c="dimmed">
            A set fills in a starting regimen; check and adjust every value for this patient.
          </Text>
        </Stack>
        <Select
          label="Drug and concentration"
          description="From the ward's active dose-limit library"
          placeholder="Choose the drug and concentration"
          data={options}
          value={ruleId}
          onChange={onRuleChange}
          allowDeselect={false}
          withAsterisk
          size="md"
          error={ruleError}
          nothingFoundMessage="The ward's library has no rules"
        />
        {findings.map((finding) => (
          <FindingLine key={finding.code} finding={finding} withEffect />
        ))}
      </Stack>
    </Paper>
  );
}
