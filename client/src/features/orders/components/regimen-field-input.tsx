import type { ReactNode } from 'react';
import { Group, Stack, Text, Textarea, TextInput } from '@mantine/core';
import { IconPencil } from '@tabler/icons-react';
import { type Finding, isBlockingFinding, MIN_REASON_LENGTH, REGIMEN_FIELD_LABELS, type RegimenField } from '@lockstep/shared';
import { FindingLine } from './finding-line';

type InputProps = {
  value: string;
  onChange: (value: string) => void;
  onBlur: () => void;
  error?: ReactNode;
};

export interface RegimenFieldInputProps {
  field: RegimenField;
  /** Display unit of the typed amount ('mg', 'mg/h', 'min'). */
  unit: string;
  /** The rule's limits for this field, as text. */
  limitsText: string | null;
  required: boolean;
  input: InputProps;
  /** This field's findings, worst first. */
  findings: Finding[];
  /** Present when the field is outside a soft limit: the reason input. */
  reason?: InputProps;
  /** What the field held in the returned version, when it now differs. */
  was?: string | null;
}

/** One regimen amount, its limits, each of its findings beside it, and a reason when one is needed. */
export function RegimenFieldInput({ field, unit, limitsText, required, input, findings, reason, was }: RegimenFieldInputProps) {
  const label = REGIMEN_FIELD_LABELS[field];
  const blocked = findings.some(isBlockingFinding);
  return (
    <Stack gap={6}>
      <TextInput
        label={label}
        description={limitsText ?? (required ? undefined : 'Optional')}
        withAsterisk={required}
        size="md"
        inputMode="decimal"
        autoComplete="off"
        spellCheck={false}
        className="tabular-nums"
        rightSection={
          <Text size="sm" c="dimmed" aria-hidden>
            {unit}
          </Text>
        }
        rightSectionWidth={unit.length > 3 ? 64 : 48}
        value={input.value}
        onChange={(event) => input.onChange(event.currentTarget.value)}
        onBlur={input.onBlur}
        // Red as well as the finding's words below: never colour alone.
        error={input.error ?? (blocked ? true : undefined)}
        data-field={field}
      />
      {was ? (
        <Group gap={4} wrap="nowrap">
          <IconPencil size={14} color="var(--mantine-color-yellow-8)" aria-hidden />
          <Text size="xs" c="dimmed">
            Changed. {was}
          </Text>
        </Group>
      ) : null}
      {findings.map((finding) => (
        <FindingLine key={`${finding.code}-${finding.field}`} finding={finding} withEffect />
      ))}
      {reason ? (
        <Textarea
          label={`Reason for the ${label.toLowerCase()} outside the soft limit`}
          description={`Needed to sign; at least ${MIN_REASON_LENGTH} characters`}
          autosize
          minRows={2}
          size="md"
          withAsterisk
          value={reason.value}
          onChange={(event) => reason.onChange(event.currentTarget.value)}
          onBlur={reason.onBlur}
          error={reason.error}
        />
      ) : null}
    </Stack>
  );
}
