import { useState, type FormEvent } from 'react';
import { Stack, Text, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { IconBarcode, IconSignature } from '@tabler/icons-react';
import { formatDose, normaliseReleaseCode } from '@lockstep/shared';
import { isApiRequestError } from '@/lib/api-error';
import { readNumber } from '@/lib/number-input';
import type { BedsideOrder } from '../api/bedside-schemas';
import { useChangeSyringe, type SyringeChangeResponse } from '../api/change-syringe';
import { volumeRule, type EndSyringeValues } from '../utils/end-syringe-form';
import { releaseCodeProblem } from '../utils/identity-check';
import { placeServerErrors } from '../utils/server-errors';
import { stepWithErrors, validateStepFields } from '../utils/step-form';
import { runningSyringe } from '../utils/syringe-state';
import { BedsideOrderPage } from './bedside-order-page';
import { BedsideSteps } from './bedside-steps';
import { ColleagueFields } from './colleague-fields';
import { DiscrepancyPreview } from './discrepancy-preview';
import { OrderNotice } from './order-notice';
import { StepActions } from './step-actions';
import { StepAlert } from './step-alert';
import { StepPanel } from './step-panel';
import { SyringeChanged } from './syringe-changed';
import { VolumeFields } from './volume-fields';

type ChangeValues = EndSyringeValues & { newReleaseCode: string };

const STEPS = [
  { label: 'Old syringe', description: 'Infused and wasted' },
  { label: 'New syringe', description: 'Code and witness' },
  { label: 'Reconciled', description: 'Then a bedside check' },
];
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

function SyringeChange({ order }: { order: BedsideOrder }) {
  const change = useChangeSyringe(order.id);
  const [step, setStep] = useState(0);
  const [changed, setChanged] = useState<SyringeChangeResponse | null>(null);
  const [alert, setAlert] = useState<string | null>(null);
  const running = runningSyringe(order.releases);
  const form = useForm<ChangeValues>({
    initialValues: { volumeInfusedMl: '', wastedMl: '', newReleaseCode: '', witness: { username: '', password: '' } },
    validate: {
      volumeInfusedMl: volumeRule('Enter the volume infused from the pump'),
      wastedMl: volumeRule('Enter the volume wasted (0 if none)'),
      newReleaseCode: (value) => releaseCodeProblem(value, order.releases),
      witness: {
        username: (value) => (value.trim() ? null : 'The witness enters their username'),
        password: (value) => (value ? null : 'The witness enters their password'),
      },
    },
  });

  if (changed) {
    return (
      <>
        <BedsideSteps steps={STEPS} active={STEPS.length} label="Syringe change steps" />
        <SyringeChanged order={order} changed={changed} />
      </>
    );
  }
  if (order.status !== 'active' || !running) {
    return <OrderNotice title="No syringe running">A syringe can be changed only while one is running for an active order.</OrderNotice>;
  }

  const send = (values: ChangeValues) =>
    change.mutate(
      {
        volumeInfusedMl: readNumber(values.volumeInfusedMl) as number,
        wastedMl: readNumber(values.wastedMl) as number,
        newReleaseCode: normaliseReleaseCode(values.newReleaseCode),
        witness: { username: values.witness.username.trim(), password: values.witness.password },
      },
      {
        onSuccess: setChanged,
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
      <BedsideSteps steps={STEPS} active={step} label="Syringe change steps" />
      {step === 0 ? (
        <StepPanel
          key="old"
          number={1}
          of={3}
          title="The old syringe"
          intro={`Syringe ${running.releaseCode}: ${formatDose(running.volumeMl, 'mL')} dispensed. Stop the pump, read the volume infused, and waste what is left in front of the witness.`}
        >
          <form onSubmit={submit} noValidate>
            <Stack gap="lg">
              <VolumeFields
                infusedLabel="Volume infused"
                infused={form.getInputProps('volumeInfusedMl')}
                wasted={form.getInputProps('wastedMl')}
              />
              <StepAlert title="The syringe change was not recorded">{alert}</StepAlert>
              <StepActions next="Next: new syringe" />
            </Stack>
          </form>
        </StepPanel>
      ) : (
        <StepPanel key="new" number={2} of={3} title="The new syringe and the witness">
          <form onSubmit={submit} noValidate>
            <Stack gap="lg">
              <TextInput
                label="New syringe release code"
                description="Scan or type the code on the new syringe’s label"
                size="lg"
                maw={420}
                autoComplete="off"
                autoCapitalize="characters"
                spellCheck={false}
                withAsterisk
                leftSection={<IconBarcode size={22} aria-hidden />}
                classNames={{ input: 'tabular-nums' }}
                {...form.getInputProps('newReleaseCode')}
              />
              <DiscrepancyPreview dispensedMl={running.volumeMl} infused={form.values.volumeInfusedMl} wasted={form.values.wastedMl} />
              <ColleagueFields
                who="Witness"
                username={form.getInputProps('witness.username')}
                password={form.getInputProps('witness.password')}
              />
              <Text size="sm" c="dimmed">
                Signing finishes the old syringe. The new one starts only after a bedside check by two nurses.
              </Text>
              <StepAlert title="The syringe change was not recorded">{alert}</StepAlert>
              <StepActions
                next="Sign and finish old syringe"
                nextIcon={<IconSignature size={20} aria-hidden />}
                loading={change.isPending}
                onBack={() => setStep(0)}
              />
            </Stack>
          </form>
        </StepPanel>
      )}
    </>
  );
}
