import { useState } from 'react';
import { Alert, Button, Group, Stack, Text, Title } from '@mantine/core';
import { useForm } from '@mantine/form';
import { IconAlertCircle } from '@tabler/icons-react';
import {
  OPIOID_TOLERANCE_MIN_DAYS,
  OPIOID_TOLERANCE_MIN_ORAL_MORPHINE_MG_PER_DAY,
  opioidToleranceText,
  type Patient,
} from '@lockstep/shared';
import { useUpdateOpioidTolerance } from '@/api/patients/update-opioid-tolerance';
import { NumberField } from '@/components/ui/number-field';
import { useIdempotencyKey } from '@/hooks/use-idempotency-key';
import { applyServerErrors } from '@/lib/form-errors';
import { notifySuccess } from '@/lib/notify';
import { toleranceFormErrors, toleranceFormValues, toleranceRequest, type ToleranceFormValues } from '../utils/record-forms';

/**
 * Opioid tolerance with its basis. The patient is tolerant exactly when the basis meets the FDA
 * definition (at least 60 mg oral morphine a day, or equianalgesic, for a week or longer); the
 * verdict shows as it is typed. Prescribers and pharmacists edit it (`canEdit`); audited.
 */
export function ToleranceForm({ patient, canEdit }: { patient: Patient; canEdit: boolean }) {
  const update = useUpdateOpioidTolerance();
  // One key per change saved: a double-click or a retry saves it once.
  const idempotency = useIdempotencyKey();
  const [refusal, setRefusal] = useState<string[]>([]);
  const form = useForm<ToleranceFormValues>({ initialValues: toleranceFormValues(patient), validate: toleranceFormErrors });
  const request = toleranceRequest(form.getValues());

  const submit = form.onSubmit((values) => {
    setRefusal([]);
    update.mutate(
      { patientId: patient.id, tolerance: toleranceRequest(values), idempotencyKey: idempotency.key },
      {
        onSuccess: (saved) => {
          idempotency.renew();
          notifySuccess('Opioid tolerance saved', opioidToleranceText(saved));
        },
        onError: (error) => setRefusal(applyServerErrors(form, error)),
      },
    );
  });

  return (
    <Stack gap="xs" component="section" aria-labelledby="tolerance-heading">
      <Title order={2} id="tolerance-heading">
        Opioid tolerance
      </Title>
      <Text size="sm" fw={600} data-testid="tolerance-recorded">
        {opioidToleranceText(patient)}
      </Text>
      {canEdit ? (
        <form onSubmit={submit} noValidate aria-label="Opioid tolerance basis">
          <Stack gap="xs">
            <Text size="sm" c="dimmed">
              Tolerant means at least {OPIOID_TOLERANCE_MIN_ORAL_MORPHINE_MG_PER_DAY} mg oral morphine a day (or equianalgesic) for at least{' '}
              {OPIOID_TOLERANCE_MIN_DAYS} days (US FDA definition). Leave both empty for an opioid-naive patient.
            </Text>
            <Group gap="sm" align="flex-start">
              <NumberField label="Oral morphine a day (mg)" withAsterisk={false} w={200} {...form.getInputProps('oralMorphineMgPerDay')} />
              <NumberField label="For how many days" integer withAsterisk={false} w={160} {...form.getInputProps('days')} />
            </Group>
            <Text size="sm" aria-live="polite">
              With this basis: <strong>{request.opioidTolerant ? 'opioid tolerant' : 'opioid-naive'}</strong>
            </Text>
            {refusal.length > 0 ? (
              <Alert color="red" icon={<IconAlertCircle size={16} aria-hidden />}>
                {refusal.join(' ')}
              </Alert>
            ) : null}
            <Group>
              <Button type="submit" size="xs" loading={update.isPending}>
                Save tolerance
              </Button>
            </Group>
          </Stack>
        </form>
      ) : null}
    </Stack>
  );
}
