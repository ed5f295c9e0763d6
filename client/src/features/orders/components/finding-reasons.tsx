import { Paper, Stack, Text, Textarea, Title } from '@mantine/core';
import type { UseFormReturnType } from '@mantine/form';
import type { Finding } from '@lockstep/shared';
import { FindingLine } from './finding-line';
import type { OrderFormValues } from '../utils/order-form';

/** What each reason is for, by the field its finding names. */
const REASON_LABELS: Readonly<Record<string, string>> = {
  drugId: 'Reason to order this drug for this patient',
  weightKg: 'Reason to go ahead with this weight',
  patientId: 'Reason to go ahead for this patient',
};

/** What a reason for a soft finding on a field other than a regimen value is about, for the sign dialog's list. */
const REASON_SUBJECTS: Readonly<Record<string, string>> = {
  drugId: 'Drug (recorded allergy or intolerance)',
  weightKg: 'Weight',
  patientId: 'Patient',
};

export function reasonSubject(field: string): string {
  return REASON_SUBJECTS[field] ?? field;
}

export interface FindingReasonsProps {
  form: UseFormReturnType<OrderFormValues>;
  /** Soft findings about something other than a regimen value (a recorded allergy, the weight), each needing a reason to sign. */
  findings: readonly Finding[];
}

/**
 * The reasons for soft findings that are not about one regimen value: a recorded allergy or
 * intolerance to the drug, a weight to check. Each field's findings, then one reason for them.
 */
export function FindingReasons({ form, findings }: FindingReasonsProps) {
  const fields = [...new Set(findings.map((finding) => finding.field))];
  if (fields.length === 0) return null;
  return (
    <Paper withBorder radius="md" p="md" component="section" aria-labelledby="finding-reasons-heading">
      <Stack gap="md">
        <Title order={2} id="finding-reasons-heading">
          Reasons needed
        </Title>
        {fields.map((field) => (
          <Stack key={field} gap="xs">
            {findings
              .filter((finding) => finding.field === field)
              .map((finding) => (
                <FindingLine key={finding.code + finding.message} finding={finding} withEffect />
              ))}
            <Textarea
              label={REASON_LABELS[field] ?? 'Reason to go ahead'}
              withAsterisk
              autosize
              minRows={2}
              {...form.getInputProps(`otherReasons.${field}`)}
            />
          </Stack>
        ))}
        <Text size="xs" c="dimmed">
          The reason is kept with the signed order and shown to the pharmacist.
        </Text>
      </Stack>
    </Paper>
  );
}
