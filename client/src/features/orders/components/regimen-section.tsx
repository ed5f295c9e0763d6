import { Paper, SimpleGrid, Stack, Text, Title } from '@mantine/core';
import type { UseFormReturnType } from '@mantine/form';
import {
  REGIMEN_FIELDS,
  regimenFieldUnit,
  type Finding,
  type LimitRuleResponse,
  type OrderSummary,
  type RegimenField,
} from '@lockstep/shared';
import { findingsFor } from '../utils/findings';
import { readAmount, REQUIRED_FIELDS, type OrderFormValues } from '../utils/order-form';
import { fieldValueText, limitRangeText } from '../utils/regimen-format';
import { RegimenFieldInput } from './regimen-field-input';

export interface RegimenSectionProps {
  form: UseFormReturnType<OrderFormValues>;
  rule: LimitRuleResponse | null;
  weightKg: number | null;
  findings: Finding[];
  /** Fields outside a soft limit: each shows a reason input. */
  softFields: readonly RegimenField[];
  /** Hides "… is required" until the field has been typed in or signing is tried. */
  showFinding: (finding: Finding) => boolean;
  /** The returned order being revised: a changed field shows what it was. */
  revising?: Pick<OrderSummary, RegimenField | 'doseUnit'>;
}

const SAME_NUMBER = 1e-9;

/** "Was 2.5 mg in the returned version", when the typed value differs from it. */
function wasText(field: RegimenField, typed: string, revising: RegimenSectionProps['revising']): string | null {
  if (!revising) return null;
  const before = revising[field];
  const now = readAmount(typed);
  const same = before === null ? now === null : now !== null && Math.abs(now - before) < SAME_NUMBER;
  return same ? null : `Was ${fieldValueText(field, before, revising.doseUnit)} in the returned version`;
}

/** The regimen amounts, two to a row, each with its limits and findings beside it. */
export function RegimenSection({ form, rule, weightKg, findings, softFields, showFinding, revising }: RegimenSectionProps) {
  const doseUnit = rule?.doseUnit ?? 'mg';
  const inputOf = (path: string) => {
    const props = form.getInputProps(path);
    return {
      value: String(props.value ?? ''),
      onChange: (value: string) => props.onChange(value),
      onBlur: () => props.onBlur?.(),
      error: props.error,
    };
  };
  return (
    <Paper withBorder radius="md" p="md">
      <Stack gap="md">
        <div>
          <Title order={2}>Regimen</Title>
          <Text size="sm" c="dimmed">
            Amounts in {doseUnit}
            {rule?.perKg ? ' (the limits are per kg; enter the amount for this patient)' : ''}; lockout in minutes.
          </Text>
        </div>
        <SimpleGrid cols={{ base: 1, md: 2 }} spacing="lg" verticalSpacing="lg">
          {REGIMEN_FIELDS.map((field) => (
            <RegimenFieldInput
              key={field}
              field={field}
              unit={regimenFieldUnit(field, doseUnit, false)}
              limitsText={rule ? limitRangeText(field, rule.limits[field], doseUnit, rule.perKg, weightKg) : null}
              required={REQUIRED_FIELDS.includes(field)}
              input={inputOf(field)}
              findings={findingsFor(findings, field).filter(showFinding)}
              reason={softFields.includes(field) ? inputOf(`reasons.${field}`) : undefined}
              was={wasText(field, form.values[field], revising)}
            />
          ))}
        </SimpleGrid>
      </Stack>
    </Paper>
  );
}
