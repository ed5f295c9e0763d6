import { useState } from 'react';
import { Alert, Button, Group, Stack, Text, TextInput, Title } from '@mantine/core';
import { useForm } from '@mantine/form';
import { IconAlertCircle } from '@tabler/icons-react';
import type { Patient } from '@lockstep/shared';
import { useRecordWeight } from '@/api/patients/record-weight';
import { NumberField } from '@/components/ui/number-field';
import { useIdempotencyKey } from '@/hooks/use-idempotency-key';
import { applyServerErrors } from '@/lib/form-errors';
import { notifySuccess } from '@/lib/notify';
import { formatWeight, formatWeightDate, localToday } from '../utils/patient-format';
import { weightFormErrors, weightRequest, type WeightFormValues } from '../utils/record-forms';

/** The weight with the day it was measured; nurses and prescribers (`canEdit`) record a new one, audited. */
export function WeightForm({ patient, canEdit }: { patient: Patient; canEdit: boolean }) {
  const record = useRecordWeight();
  // One key per weight typed: a double-click or a retry records it once; the next one gets a new key.
  const idempotency = useIdempotencyKey();
  const [refusal, setRefusal] = useState<string[]>([]);
  const today = localToday();
  const form = useForm<WeightFormValues>({
    initialValues: { weightKg: '', measuredOn: today },
    validate: (values) => weightFormErrors(values, patient.dateOfBirth, today),
  });

  const submit = form.onSubmit((values) => {
    setRefusal([]);
    record.mutate(
      { patientId: patient.id, weight: weightRequest(values), idempotencyKey: idempotency.key },
      {
        onSuccess: (saved) => {
          idempotency.renew();
          notifySuccess('Weight recorded', `${formatWeight(saved.weightKg)}, ${formatWeightDate(saved.weightMeasuredOn, today)}`);
          form.reset();
        },
        onError: (error) => setRefusal(applyServerErrors(form, error)),
      },
    );
  });

  return (
    <Stack gap="xs" component="section" aria-labelledby="weight-heading">
      <Title order={2} id="weight-heading">
        Weight
      </Title>
      <Text size="sm" className="tabular-nums" data-testid="weight-recorded">
        <strong>{formatWeight(patient.weightKg)}</strong>
        {patient.weightKg === null ? null : `, ${formatWeightDate(patient.weightMeasuredOn, today)}`}
      </Text>
      {canEdit ? (
        <form onSubmit={submit} noValidate aria-label="Record a weight">
          <Stack gap="xs">
            <Group gap="sm" align="flex-start">
              <NumberField label="New weight (kg)" w={160} {...form.getInputProps('weightKg')} />
              <TextInput label="Measured on" type="date" withAsterisk w={180} max={today} {...form.getInputProps('measuredOn')} />
            </Group>
            {refusal.length > 0 ? (
              <Alert color="red" icon={<IconAlertCircle size={16} aria-hidden />}>
                {refusal.join(' ')}
              </Alert>
            ) : null}
            <Group>
              <Button type="submit" size="xs" loading={record.isPending}>
                Record weight
              </Button>
            </Group>
          </Stack>
        </form>
      ) : null}
    </Stack>
  );
}
