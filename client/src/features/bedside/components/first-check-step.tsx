import { useState } from 'react';
import { Stack } from '@mantine/core';
import { useForm } from '@mantine/form';
import type { Drug, OrderDetail } from '@lockstep/shared';
import { useStartFirstCheck } from '@/api/orders/start-first-check';
import { useIdempotencyKey } from '@/hooks/use-idempotency-key';
import type { BouncedErrors, CheckStep } from '../hooks/use-bedside-check';
import type { IdentityValues } from '../utils/identity-check';
import { emptyPumpSettingsForm, readPumpSettingsForm, type PumpSettingsFormValues } from '@/utils/pump-settings-form';
import { placeServerErrors, stepOfFirstCheckError } from '../utils/server-errors';
import { PumpSettingsFields } from './pump-settings-fields';
import { StepActions } from './step-actions';
import { StepAlert } from './step-alert';
import { StepPanel } from './step-panel';

export interface FirstCheckStepProps {
  order: OrderDetail;
  drugs: readonly Drug[];
  nurseName: string;
  identity: IdentityValues;
  releaseCode: string;
  draft: PumpSettingsFormValues | null;
  stepCount: number;
  onSent: (checkId: number) => void;
  onBounced: (step: CheckStep, draft: PumpSettingsFormValues, bounced: BouncedErrors) => void;
  onBack: () => void;
}

const FORM_FIELDS = Object.keys(emptyPumpSettingsForm());

/** Step 3: the signed-in nurse enters what the pump is programmed with, from the pump itself. */
export function FirstCheckStep({
  order,
  drugs,
  nurseName,
  identity,
  releaseCode,
  draft,
  stepCount,
  onSent,
  onBounced,
  onBack,
}: FirstCheckStepProps) {
  const firstCheck = useStartFirstCheck(order.id);
  // One key per opening of this step: a double-click or a retry records one pending check.
  const idempotency = useIdempotencyKey();
  const [alert, setAlert] = useState<string | null>(null);
  const form = useForm<PumpSettingsFormValues>({
    initialValues: draft ?? emptyPumpSettingsForm(),
    validate: (values) => readPumpSettingsForm(values).errors,
  });

  const submit = form.onSubmit((values) => {
    const { settings } = readPumpSettingsForm(values);
    if (!settings) return;
    setAlert(null);
    firstCheck.mutate(
      { request: { ...identity, releaseCode, settings }, idempotencyKey: idempotency.key },
      {
        onSuccess: (answer) => {
          idempotency.renew();
          onSent(answer.id);
        },
        onError: (error) => {
          const step = stepOfFirstCheckError(error);
          const placed = placeServerErrors(error, step === 'first' ? FORM_FIELDS : ['patientMrn', 'patientDateOfBirth', 'releaseCode'], {
            'settings.': '',
          });
          if (step === 'first') {
            form.setErrors(placed.fieldErrors);
            setAlert(placed.alert);
          } else {
            onBounced(step, values, { fields: placed.fieldErrors, alert: placed.alert });
          }
        },
      },
    );
  });

  return (
    <StepPanel
      number={3}
      of={stepCount}
      title={`First check: ${nurseName}`}
      intro="Read each setting from the pump as it is programmed now, and enter it here. The second nurse will not see your entry."
    >
      <form onSubmit={submit} noValidate>
        <Stack gap="lg">
          <PumpSettingsFields
            drugs={drugs}
            drugId={form.values.drugId}
            fallbackUnit={order.doseUnit}
            inputProps={(field) => form.getInputProps(field)}
          />
          <StepAlert title="The first check was not saved">{alert}</StepAlert>
          <StepActions next="Save first check" loading={firstCheck.isPending} onBack={onBack} />
        </Stack>
      </form>
    </StepPanel>
  );
}
