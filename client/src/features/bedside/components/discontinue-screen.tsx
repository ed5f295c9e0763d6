import { useState, type FormEvent } from 'react';
import { Alert, Stack, Textarea } from '@mantine/core';
import { useForm } from '@mantine/form';
import { IconAlertTriangle, IconSignature } from '@tabler/icons-react';
import { formatDose, MIN_REASON_LENGTH, tallMan } from '@lockstep/shared';
import { isApiRequestError } from '@/lib/api-error';
import { readNumber } from '@/lib/number-input';
import type { BedsideOrder } from '../api/bedside-schemas';
import { useDiscontinueOrder, type DiscontinueResponse } from '../api/discontinue-order';
import { volumeRule, type EndSyringeValues } from '../utils/end-syringe-form';
import { placeServerErrors } from '../utils/server-errors';
import { stepWithErrors, validateStepFields } from '../utils/step-form';
import { runningSyringe } from '../utils/syringe-state';
import { BedsideOrderPage } from './bedside-order-page';
import { BedsideSteps } from './bedside-steps';
import { ColleagueFields } from './colleague-fields';
import { DiscontinuedResult } from './discontinued-result';
import { DiscrepancyPreview } from './discrepancy-preview';
import { OrderNotice } from './order-notice';
import { StepActions } from './step-actions';
import { StepAlert } from './step-alert';
import { StepPanel } from './step-panel';
import { VolumeFields } from './volume-fields';

type DiscontinueValues = EndSyringeValues & { reason: string };

const STEPS = [
  { label: 'Reason and volumes', description: 'Prescriber’s decision' },
  { label: 'Confirm', description: 'Witness co-signs' },
  { label: 'Discontinued', description: 'Reconciled' },
];
const STEP_FIELDS = [
  ['reason', 'volumeInfusedMl', 'wastedMl'],
  ['witness.username', 'witness.password'],
];

export function DiscontinueScreen({ orderId }: { orderId: number }) {
  return (
    <BedsideOrderPage orderId={orderId} title="Discontinue PCA" showRegimen>
      {(order) => <Discontinue order={order} />}
    </BedsideOrderPage>
  );
}

function Discontinue({ order }: { order: BedsideOrder }) {
  const discontinue = useDiscontinueOrder(order.id);
  const [step, setStep] = useState(0);
  const [done, setDone] = useState<DiscontinueResponse | null>(null);
  const [alert, setAlert] = useState<string | null>(null);
  const running = runningSyringe(order.releases);
  const form = useForm<DiscontinueValues>({
    initialValues: { reason: '', volumeInfusedMl: '', wastedMl: '', witness: { username: '', password: '' } },
    validate: {
      reason: (value) =>
        value.trim().length >= MIN_REASON_LENGTH ? null : `Give the prescriber’s decision in at least ${MIN_REASON_LENGTH} characters`,
      volumeInfusedMl: volumeRule('Enter the final volume infused from the pump'),
      wastedMl: volumeRule('Enter the volume wasted (0 if none)'),
      witness: {
        username: (value) => (value.trim() ? null : 'The witness enters their username'),
        password: (value) => (value ? null : 'The witness enters their password'),
      },
    },
  });

  if (done) {
    return (
      <>
        <BedsideSteps steps={STEPS} active={STEPS.length} label="Discontinue steps" />
        <DiscontinuedResult done={done} />
      </>
    );
  }
  if (order.status !== 'active' || !running) {
    return (
      <OrderNotice title="Nothing to discontinue here">
        Only an active PCA with a running syringe is discontinued at the bedside.
      </OrderNotice>
    );
  }

  const send = (values: DiscontinueValues) =>
    discontinue.mutate(
      {
        reason: values.reason.trim(),
        volumeInfusedMl: readNumber(values.volumeInfusedMl) as number,
        wastedMl: readNumber(values.wastedMl) as number,
        witness: { username: values.witness.username.trim(), password: values.witness.password },
      },
      {
        onSuccess: setDone,
        onError: (error) => {
          form.setFieldValue('witness.password', '');
          const placed = placeServerErrors(error, STEP_FIELDS.flat());
          if (isApiRequestError(error) && error.status === 403) placed.fieldErrors['witness.username'] = error.message;
          form.setErrors(placed.fieldErrors);
          setAlert(placed.alert);
          setStep((current) => stepWithErrors(Object.keys(placed.fieldErrors), STEP_FIELDS) ?? current);
        },
      },
    );

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    if (!validateStepFields(form, STEP_FIELDS[step])) return;
    setAlert(null);
    if (step === 0) setStep(1);
    else send(form.getValues());
  };

  return (
    <>
      <BedsideSteps steps={STEPS} active={step} label="Discontinue steps" />
      {step === 0 ? (
        <StepPanel
          key="reason"
          number={1}
          of={3}
          title="Reason and final volumes"
          intro={`Syringe ${running.releaseCode}: ${formatDose(running.volumeMl, 'mL')} dispensed. Stop the pump, read the final volume infused, and waste what is left in front of the witness.`}
        >
          <form onSubmit={submit} noValidate>
            <Stack gap="lg">
              <Textarea
                label="Reason"
                description="The prescriber’s decision, e.g. “Pain controlled on oral analgesia; PCA stopped by the acute pain team”"
                size="lg"
                autosize
                minRows={2}
                withAsterisk
                {...form.getInputProps('reason')}
              />
              <VolumeFields
                infusedLabel="Final volume infused"
                infused={form.getInputProps('volumeInfusedMl')}
                wasted={form.getInputProps('wastedMl')}
              />
              <StepAlert title="The PCA was not discontinued">{alert}</StepAlert>
              <StepActions next="Next: confirm" />
            </Stack>
          </form>
        </StepPanel>
      ) : (
        <StepPanel key="confirm" number={2} of={3} title="Confirm and co-sign">
          <form onSubmit={submit} noValidate>
            <Stack gap="lg">
              <Alert color="orange" variant="light" icon={<IconAlertTriangle aria-hidden />} title="This ends the PCA">
                {tallMan(order.drugName)} PCA for {order.patientName} stops for good: the syringe is finished and the order is discontinued.
                A new PCA needs a new order.
              </Alert>
              <DiscrepancyPreview dispensedMl={running.volumeMl} infused={form.values.volumeInfusedMl} wasted={form.values.wastedMl} />
              <ColleagueFields
                who="Witness"
                username={form.getInputProps('witness.username')}
                password={form.getInputProps('witness.password')}
              />
              <StepAlert title="The PCA was not discontinued">{alert}</StepAlert>
              <StepActions
                next="Sign and discontinue"
                nextIcon={<IconSignature size={20} aria-hidden />}
                loading={discontinue.isPending}
                onBack={() => setStep(0)}
              />
            </Stack>
          </form>
        </StepPanel>
      )}
    </>
  );
}
