import { Text } from '@mantine/core';
import { useForm } from '@mantine/form';
import { formatDose, normaliseReleaseCode, type OrderDetail } from '@lockstep/shared';
import { readNumber } from '@/lib/number-input';
import { useChangeSyringe } from '@/api/orders/change-syringe';
import { emptyWitness, useWitnessedStep, WITNESS_RULES } from '../hooks/use-witnessed-step';
import { volumeRule, type EndSyringeValues } from '../utils/end-syringe-form';
import { releaseCodeProblem } from '../utils/identity-check';
import { runningSyringe } from '../utils/syringe-state';
import { BedsideOrderPage } from './bedside-order-page';
import { DiscrepancyPreview } from './discrepancy-preview';
import { OrderNotice } from './order-notice';
import { ReleaseCodeInput } from './release-code-input';
import { SyringeChanged } from './syringe-changed';
import { VolumeFields } from './volume-fields';
import { WitnessedDone, WitnessedSteps } from './witnessed-steps';

type ChangeValues = EndSyringeValues & { newReleaseCode: string };

const STEPS = [
  { label: 'Old syringe', description: 'Infused and wasted' },
  { label: 'New syringe', description: 'Code and witness' },
  { label: 'Reconciled', description: 'Then a bedside check' },
];
const STEPS_LABEL = 'Syringe change steps';
const STEP_FIELDS = [
  ['volumeInfusedMl', 'wastedMl'],
  ['newReleaseCode', 'witness.username', 'witness.password'],
];

export function SyringeChangeScreen({ orderId }: { orderId: number }) {
  return (
    <BedsideOrderPage orderId={orderId} title="Change syringe" showRegimen>
      {(order) => <SyringeChange order={order} />}
    </BedsideOrderPage>
  );
}

function SyringeChange({ order }: { order: OrderDetail }) {
  const change = useChangeSyringe(order.id);
  const running = runningSyringe(order.releases);
  const form = useForm<ChangeValues>({
    initialValues: { volumeInfusedMl: '', wastedMl: '', newReleaseCode: '', witness: emptyWitness() },
    validate: {
      volumeInfusedMl: volumeRule('Enter the volume infused from the pump'),
      wastedMl: volumeRule('Enter the volume wasted (0 if none)'),
      newReleaseCode: (value) => releaseCodeProblem(value, order.releases),
      witness: WITNESS_RULES,
    },
  });
  const task = useWitnessedStep({
    form,
    stepFields: STEP_FIELDS,
    mutation: change,
    toRequest: (values, witness) => ({
      volumeInfusedMl: readNumber(values.volumeInfusedMl) as number,
      wastedMl: readNumber(values.wastedMl) as number,
      newReleaseCode: normaliseReleaseCode(values.newReleaseCode),
      witness,
    }),
  });

  if (task.result) {
    return (
      <WitnessedDone steps={STEPS} label={STEPS_LABEL}>
        <SyringeChanged order={order} changed={task.result} />
      </WitnessedDone>
    );
  }
  if (order.status !== 'active' || !running) {
    return <OrderNotice title="No syringe running">A syringe can be changed only while one is running for an active order.</OrderNotice>;
  }

  return (
    <WitnessedSteps
      steps={STEPS}
      label={STEPS_LABEL}
      task={task}
      notDone="The syringe change was not recorded"
      fill={{
        title: 'The old syringe',
        intro: `Syringe ${running.releaseCode}: ${formatDose(running.volumeMl, 'mL')} dispensed. Stop the pump, read the volume infused, and waste what is left in front of the witness.`,
        next: 'Next: new syringe',
        fields: (
          <VolumeFields
            infusedLabel="Volume infused"
            infused={form.getInputProps('volumeInfusedMl')}
            wasted={form.getInputProps('wastedMl')}
          />
        ),
      }}
      sign={{
        title: 'The new syringe and the witness',
        next: 'Sign and finish old syringe',
        fields: (
          <>
            <ReleaseCodeInput
              label="New syringe release code"
              description="Scan or type the code on the new syringe’s label"
              inputProps={form.getInputProps('newReleaseCode')}
            />
            <DiscrepancyPreview dispensedMl={running.volumeMl} infused={form.values.volumeInfusedMl} wasted={form.values.wastedMl} />
          </>
        ),
        after: (
          <Text size="sm" c="dimmed">
            Signing finishes the old syringe. The new one starts only after a bedside check by two nurses.
          </Text>
        ),
      }}
      witness={{ username: form.getInputProps('witness.username'), password: form.getInputProps('witness.password') }}
    />
  );
}
