import { useState } from 'react';
import { Button, Divider, Stack, Text } from '@mantine/core';
import { useForm } from '@mantine/form';
import { IconSignature } from '@tabler/icons-react';
import type { Drug, SecondCheckResponse, OrderDetail } from '@lockstep/shared';
import { isApiRequestError } from '@/lib/api-error';
import { useCompleteSecondCheck } from '@/api/orders/complete-second-check';
import { useIdempotencyKey } from '@/hooks/use-idempotency-key';
import { emptyPumpSettingsForm, readPumpSettingsForm, type PumpSettingsFormValues } from '@/utils/pump-settings-form';
import { placeServerErrors } from '../utils/server-errors';
import { ColleagueFields } from './colleague-fields';
import { PumpSettingsFields } from './pump-settings-fields';
import { StepActions } from './step-actions';
import { StepAlert } from './step-alert';
import { StepPanel } from './step-panel';

type SecondCheckValues = PumpSettingsFormValues & { username: string; password: string };

export interface SecondCheckStepProps {
  order: OrderDetail;
  drugs: readonly Drug[];
  checkId: number;
  firstNurseName: string;
  stepCount: number;
  onCompared: (result: SecondCheckResponse, secondUsername: string) => void;
  onRestart: () => void;
}

const FORM_FIELDS = ['username', 'password', ...Object.keys(emptyPumpSettingsForm())];

/**
 * Step 4: a second nurse signs in on this screen and enters the pump independently. The form
 * starts empty and is never filled from the first entry or the order.
 */
export function SecondCheckStep({ order, drugs, checkId, firstNurseName, stepCount, onCompared, onRestart }: SecondCheckStepProps) {
  const secondCheck = useCompleteSecondCheck(order.id);
  // One key per opening of this step: a double-click or a retry signs the check once.
  const idempotency = useIdempotencyKey();
  const [alert, setAlert] = useState<string | null>(null);
  const [closed, setClosed] = useState(false);
  const form = useForm<SecondCheckValues>({
    initialValues: { username: '', password: '', ...emptyPumpSettingsForm() },
    validate: (values) => ({
      ...(values.username.trim() ? {} : { username: 'The second nurse enters their username' }),
      ...(values.password ? {} : { password: 'The second nurse enters their password' }),
      ...readPumpSettingsForm(values).errors,
    }),
  });

  const submit = form.onSubmit((values) => {
    const { settings } = readPumpSettingsForm(values);
    if (!settings) return;
    setAlert(null);
    const username = values.username.trim();
    secondCheck.mutate(
      { checkId, request: { username, password: values.password, settings }, idempotencyKey: idempotency.key },
      {
        onSuccess: (result) => {
          idempotency.renew();
          onCompared(result, username);
        },
        onError: (error) => {
          form.setFieldValue('password', '');
          // 403: a pharmacist or prescriber tried to sign; that belongs beside the username.
          if (isApiRequestError(error) && error.status === 403) {
            form.setFieldError('username', error.message);
            return;
          }
          const placed = placeServerErrors(error, FORM_FIELDS, { 'settings.': '' });
          form.setErrors(placed.fieldErrors);
          setAlert(placed.alert);
          if (isApiRequestError(error) && error.status === 409) setClosed(true);
        },
      },
    );
  });

  return (
    <StepPanel
      number={4}
      of={stepCount}
      title="Second check: a second nurse"
      intro={`${firstNurseName}’s entry is saved and hidden. A second nurse or charge nurse now signs in here and reads the pump for themselves.`}
    >
      <form onSubmit={submit} noValidate>
        <Stack gap="lg">
          <ColleagueFields who="Second nurse" username={form.getInputProps('username')} password={form.getInputProps('password')} />
          <Divider label="The pump as the second nurse reads it" labelPosition="left" />
          <PumpSettingsFields
            drugs={drugs}
            drugId={form.values.drugId}
            fallbackUnit={order.doseUnit}
            inputProps={(field) => form.getInputProps(field)}
          />
          <StepAlert title="The second check was not saved">{alert}</StepAlert>
          {closed ? (
            <Button size="lg" variant="default" onClick={onRestart}>
              Start a new check
            </Button>
          ) : (
            <>
              <Text size="sm" c="dimmed">
                Signing compares both entries with the verified order. Only a full match starts the PCA.
              </Text>
              <StepActions next="Sign and compare" nextIcon={<IconSignature size={20} aria-hidden />} loading={secondCheck.isPending} />
            </>
          )}
        </Stack>
      </form>
    </StepPanel>
  );
}
