import { Alert, Textarea } from '@mantine/core';
import { useForm } from '@mantine/form';
import { IconAlertTriangle } from '@tabler/icons-react';
import { formatDose, MIN_REASON_LENGTH, tallMan, type OrderDetail } from '@lockstep/shared';
import { readNumber } from '@/lib/number-input';
import { useDiscontinueOrder } from '@/api/orders/discontinue-order';
import { emptyWitness, useWitnessedStep, WITNESS_RULES } from '../hooks/use-witnessed-step';
import { volumeRule, type EndSyringeValues } from '../utils/end-syringe-form';
import { runningSyringe } from '../utils/syringe-state';
import { BedsideOrderPage } from './bedside-order-page';
import { DiscontinuedResult } from './discontinued-result';
import { DiscrepancyPreview } from './discrepancy-preview';
import { OrderNotice } from './order-notice';
import { VolumeFields } from './volume-fields';
import { WitnessedDone, WitnessedSteps } from './witnessed-steps';

type DiscontinueValues = EndSyringeValues & { reason: string };

const STEPS = [
  { label: 'Reason and volumes', description: 'Prescriber’s decision' },
  { label: 'Confirm', description: 'Witness co-signs' },
  { label: 'Discontinued', description: 'Reconciled' },
];
const STEPS_LABEL = 'Discontinue steps';
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

function Discontinue({ order }: { order: OrderDetail }) {
  const discontinue = useDiscontinueOrder(order.id);
  const running = runningSyringe(order.releases);
  const form = useForm<DiscontinueValues>({
    initialValues: { reason: '', volumeInfusedMl: '', wastedMl: '', witness: emptyWitness() },
    validate: {
      reason: (value) =>
        value.trim().length >= MIN_REASON_LENGTH ? null : `Give the prescriber’s decision in at least ${MIN_REASON_LENGTH} characters`,
      volumeInfusedMl: volumeRule('Enter the final volume infused from the pump'),
      wastedMl: volumeRule('Enter the volume wasted (0 if none)'),
      witness: WITNESS_RULES,
    },
  });
  const task = useWitnessedStep({
    form,
    stepFields: STEP_FIELDS,
    mutation: discontinue,
    toRequest: (values, witness) => ({
      reason: values.reason.trim(),
      volumeInfusedMl: readNumber(values.volumeInfusedMl) as number,
      wastedMl: readNumber(values.wastedMl) as number,
      witness,
    }),
  });

  if (task.result) {
    return (
      <WitnessedDone steps={STEPS} label={STEPS_LABEL}>
        <DiscontinuedResult done={task.result} />
      </WitnessedDone>
    );
  }
  if (order.status !== 'active' || !running) {
    return (
      <OrderNotice title="Nothing to discontinue here">
        Only an active PCA with a running syringe is discontinued at the bedside.
      </OrderNotice>
    );
  }

  return (
    <WitnessedSteps
      steps={STEPS}
      label={STEPS_LABEL}
      task={task}
      notDone="The PCA was not discontinued"
      fill={{
        title: 'Reason and final volumes',
        intro: `Syringe ${running.releaseCode}: ${formatDose(running.volumeMl, 'mL')} dispensed. Stop the pump, read the final volume infused, and waste what is left in front of the witness.`,
        next: 'Next: confirm',
        fields: (
          <>
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
          </>
        ),
      }}
      sign={{
        title: 'Confirm and co-sign',
        next: 'Sign and discontinue',
        fields: (
          <>
            <Alert color="orange" variant="light" icon={<IconAlertTriangle aria-hidden />} title="This ends the PCA">
              {tallMan(order.drugName)} PCA for {order.patientName} stops for good: the syringe is finished and the order is discontinued. A
              new PCA needs a new order.
            </Alert>
            <DiscrepancyPreview dispensedMl={running.volumeMl} infused={form.values.volumeInfusedMl} wasted={form.values.wastedMl} />
          </>
        ),
      }}
      witness={{ username: form.getInputProps('witness.username'), password: form.getInputProps('witness.password') }}
    />
  );
}
