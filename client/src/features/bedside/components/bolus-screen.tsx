import { useState, type FormEvent } from 'react';
import { Stack, Textarea } from '@mantine/core';
import { useForm } from '@mantine/form';
import { IconSignature } from '@tabler/icons-react';
import { formatDose, MIN_REASON_LENGTH, tallMan } from '@lockstep/shared';
import { NumberField } from '@/components/ui/number-field';
import { isApiRequestError } from '@/lib/api-error';
import { readNumber, type NumberFieldValue } from '@/lib/number-input';
import type { BedsideOrder } from '../api/bedside-schemas';
import { useGiveBolus, type BolusResponse } from '../api/give-bolus';
import { placeServerErrors } from '../utils/server-errors';
import { stepWithErrors, validateStepFields } from '../utils/step-form';
import { syringeState } from '../utils/syringe-state';
import { BedsideOrderPage } from './bedside-order-page';
import { BedsideSteps } from './bedside-steps';
import { BolusGiven } from './bolus-given';
import { ColleagueFields } from './colleague-fields';
import { OrderNotice } from './order-notice';
import { StepActions } from './step-actions';
import { StepAlert } from './step-alert';
import { StepPanel } from './step-panel';

type BolusValues = { amount: NumberFieldValue; reason: string; overrideReason: string; witness: { username: string; password: string } };

const STEPS = [
  { label: 'Bolus', description: 'Amount and reason' },
  { label: 'Witness', description: 'Second nurse co-signs' },
  { label: 'Given', description: 'Recorded' },
];
const STEP_FIELDS = [
  ['amount', 'reason', 'overrideReason'],
  ['witness.username', 'witness.password'],
];

export function BolusScreen({ orderId }: { orderId: number }) {
  return (
    <BedsideOrderPage orderId={orderId} title="Clinician bolus" showRegimen>
      {(order) => <Bolus order={order} />}
    </BedsideOrderPage>
  );
}

function Bolus({ order }: { order: BedsideOrder }) {
  const bolus = useGiveBolus(order.id);
  const [step, setStep] = useState(0);
  const [given, setGiven] = useState<BolusResponse | null>(null);
  const [needsOverride, setNeedsOverride] = useState(false);
  const [alert, setAlert] = useState<string | null>(null);
  const unit = order.doseUnit;
  const maximum = order.clinicianBolusDose;
  const reasonRule = (value: string) =>
    value.trim().length >= MIN_REASON_LENGTH ? null : `Give a reason of at least ${MIN_REASON_LENGTH} characters`;
  const form = useForm<BolusValues>({
    initialValues: { amount: '', reason: '', overrideReason: '', witness: { username: '', password: '' } },
    validate: {
      amount: (value) => {
        const amount = readNumber(value);
        if (amount === null || amount === undefined || amount <= 0) return `Enter the bolus in ${unit}`;
        return maximum !== null && amount > maximum ? `The most this order allows is ${formatDose(maximum, unit)}` : null;
      },
      reason: reasonRule,
      overrideReason: (value) => (needsOverride ? reasonRule(value) : null),
      witness: {
        username: (value) => (value.trim() ? null : 'The witness enters their username'),
        password: (value) => (value ? null : 'The witness enters their password'),
      },
    },
  });

  if (given) {
    return (
      <>
        <BedsideSteps steps={STEPS} active={STEPS.length} label="Clinician bolus steps" />
        <BolusGiven order={order} bolus={given} />
      </>
    );
  }
  if (order.status !== 'active' || syringeState(order.releases) !== 'running') {
    return (
      <OrderNotice title="No bolus now">A clinician bolus can be given only while a syringe is running for an active order.</OrderNotice>
    );
  }
  if (maximum === null)
    return <OrderNotice title="No clinician bolus ordered">This order has no clinician bolus: ask the prescriber.</OrderNotice>;

  const send = (values: BolusValues) =>
    bolus.mutate(
      {
        amount: readNumber(values.amount) as number,
        reason: values.reason.trim(),
        overrideReason: needsOverride ? values.overrideReason.trim() : undefined,
        witness: { username: values.witness.username.trim(), password: values.witness.password },
      },
      {
        onSuccess: setGiven,
        onError: (error) => {
          form.setFieldValue('witness.password', '');
          const placed = placeServerErrors(error, STEP_FIELDS.flat());
          if (isApiRequestError(error) && error.status === 403) placed.fieldErrors['witness.username'] = error.message;
          if (placed.fieldErrors.overrideReason) setNeedsOverride(true);
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
      <BedsideSteps steps={STEPS} active={step} label="Clinician bolus steps" />
      {step === 0 ? (
        <StepPanel key="bolus" number={1} of={3} title="Bolus and reason">
          <form onSubmit={submit} noValidate>
            <Stack gap="lg">
              <NumberField
                label={`Bolus (${unit})`}
                description={`Ordered clinician bolus: at most ${formatDose(maximum, unit)} of ${tallMan(order.drugName)}`}
                size="lg"
                maw={420}
                {...form.getInputProps('amount')}
              />
              <Textarea
                label="Reason"
                description="For example: pain score 8 on movement despite demand doses"
                size="lg"
                autosize
                minRows={2}
                withAsterisk
                {...form.getInputProps('reason')}
              />
              {needsOverride ? (
                <Textarea
                  label="Reason for going outside the ward’s soft limit"
                  size="lg"
                  autosize
                  minRows={2}
                  withAsterisk
                  {...form.getInputProps('overrideReason')}
                />
              ) : null}
              <StepAlert title="The bolus was not given">{alert}</StepAlert>
              <StepActions next="Next: witness" />
            </Stack>
          </form>
        </StepPanel>
      ) : (
        <StepPanel
          key="witness"
          number={2}
          of={3}
          title="Witness co-signs"
          intro={`A second nurse checks ${formatDose(readNumber(form.values.amount) ?? NaN, unit)} of ${tallMan(order.drugName)} for ${order.patientName} and signs here.`}
        >
          <form onSubmit={submit} noValidate>
            <Stack gap="lg">
              <ColleagueFields
                who="Witness"
                username={form.getInputProps('witness.username')}
                password={form.getInputProps('witness.password')}
              />
              <StepAlert title="The bolus was not given">{alert}</StepAlert>
              <StepActions
                next="Sign and record bolus"
                nextIcon={<IconSignature size={20} aria-hidden />}
                loading={bolus.isPending}
                onBack={() => setStep(0)}
              />
            </Stack>
          </form>
        </StepPanel>
      )}
    </>
  );
}
