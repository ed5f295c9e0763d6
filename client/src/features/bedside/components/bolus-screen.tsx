import { useState } from 'react';
import { Textarea } from '@mantine/core';
import { useForm } from '@mantine/form';
import { formatDose, MIN_REASON_LENGTH, syringeState, tallMan, type OrderDetail } from '@lockstep/shared';
import { NumberField } from '@/components/ui/number-field';
import { readNumber, type NumberFieldValue } from '@/lib/number-input';
import { useGiveBolus } from '@/api/orders/give-bolus';
import { useObservations } from '@/api/orders/get-observations';
import { emptyWitness, useWitnessedStep, WITNESS_RULES, type WitnessedValues } from '../hooks/use-witnessed-step';
import { BedsideOrderPage } from './bedside-order-page';
import { BolusGiven } from './bolus-given';
import { BolusSafetyPanel } from './bolus-safety-panel';
import { OrderNotice } from './order-notice';
import { WitnessedDone, WitnessedSteps } from './witnessed-steps';

type BolusValues = WitnessedValues & { amount: NumberFieldValue; reason: string; overrideReason: string };

const STEPS = [
  { label: 'Bolus', description: 'Amount and reason' },
  { label: 'Witness', description: 'Second nurse co-signs' },
  { label: 'Given', description: 'Recorded' },
];
const STEPS_LABEL = 'Clinician bolus steps';
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

function Bolus({ order }: { order: OrderDetail }) {
  const bolus = useGiveBolus(order.id);
  const observations = useObservations(order.id);
  const [needsOverride, setNeedsOverride] = useState(false);
  const unit = order.doseUnit;
  const maximum = order.clinicianBolusDose;
  const reasonRule = (value: string) =>
    value.trim().length >= MIN_REASON_LENGTH ? null : `Give a reason of at least ${MIN_REASON_LENGTH} characters`;
  const form = useForm<BolusValues>({
    initialValues: { amount: '', reason: '', overrideReason: '', witness: emptyWitness() },
    validate: {
      amount: (value) => {
        const amount = readNumber(value);
        if (amount === null || amount === undefined || amount <= 0) return `Enter the bolus in ${unit}`;
        return maximum !== null && amount > maximum ? `The most this order allows is ${formatDose(maximum, unit)}` : null;
      },
      reason: reasonRule,
      overrideReason: (value) => (needsOverride ? reasonRule(value) : null),
      witness: WITNESS_RULES,
    },
  });
  const task = useWitnessedStep({
    form,
    stepFields: STEP_FIELDS,
    mutation: bolus,
    toRequest: (values, witness) => ({
      amount: readNumber(values.amount) as number,
      reason: values.reason.trim(),
      overrideReason: needsOverride ? values.overrideReason.trim() : undefined,
      witness,
    }),
    // The server asks for a reason when the bolus is outside the ward's soft limit.
    onRefused: (fieldErrors) => {
      if (fieldErrors.overrideReason) setNeedsOverride(true);
    },
  });

  if (task.result) {
    return (
      <WitnessedDone steps={STEPS} label={STEPS_LABEL}>
        <BolusGiven order={order} bolus={task.result} />
      </WitnessedDone>
    );
  }
  if (order.status !== 'active' || syringeState(order.releases) !== 'running') {
    return (
      <OrderNotice title="No bolus now">A clinician bolus can be given only while a syringe is running for an active order.</OrderNotice>
    );
  }
  if (maximum === null)
    return <OrderNotice title="No clinician bolus ordered">This order has no clinician bolus: ask the prescriber.</OrderNotice>;

  const reasonField = (path: 'reason' | 'overrideReason', label: string, description?: string) => (
    <Textarea label={label} description={description} size="lg" autosize minRows={2} withAsterisk {...form.getInputProps(path)} />
  );
  return (
    <WitnessedSteps
      steps={STEPS}
      label={STEPS_LABEL}
      task={task}
      notDone="The bolus was not given"
      fill={{
        title: 'Bolus and reason',
        next: 'Next: witness',
        fields: (
          <>
            <BolusSafetyPanel observation={observations.data?.at(-1) ?? null} flags={order.flags} loading={observations.isPending} />
            <NumberField
              label={`Bolus (${unit})`}
              description={`Ordered clinician bolus: at most ${formatDose(maximum, unit)} of ${tallMan(order.drugName)}`}
              size="lg"
              maw={420}
              {...form.getInputProps('amount')}
            />
            {reasonField('reason', 'Reason', 'For example: pain score 8 on movement despite demand doses')}
            {needsOverride ? reasonField('overrideReason', 'Reason for going outside the ward’s soft limit') : null}
          </>
        ),
      }}
      sign={{
        title: 'Witness co-signs',
        intro: `A second nurse checks ${formatDose(readNumber(form.values.amount) ?? NaN, unit)} of ${tallMan(order.drugName)} for ${order.patientName} and signs here.`,
        next: 'Sign and record bolus',
      }}
      witness={{ username: form.getInputProps('witness.username'), password: form.getInputProps('witness.password') }}
    />
  );
}
