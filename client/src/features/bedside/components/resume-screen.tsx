import { useState } from 'react';
import { Alert, Button, Group, Stack, Text, Textarea, Title } from '@mantine/core';
import { useForm } from '@mantine/form';
import { useNavigate } from 'react-router-dom';
import { MIN_REASON_LENGTH, PUMP_SETTING_LABELS, type OrderDetail, type PcaPauseState } from '@lockstep/shared';
import { paths } from '@/config/paths';
import { applyServerErrors } from '@/lib/form-errors';
import { useIdempotencyKey } from '@/hooks/use-idempotency-key';
import { useDrugs } from '@/api/drugs/get-drugs';
import { usePauseState, useResumePca } from '@/api/orders/pca-pause';
import { emptyPumpSettingsForm, readPumpSettingsForm, type PumpSettingsFormValues } from '@/utils/pump-settings-form';
import { BedsideOrderPage } from './bedside-order-page';
import { ColleagueFields } from './colleague-fields';
import { OrderNotice } from './order-notice';
import { PumpSettingsFields } from './pump-settings-fields';

const reasonRule = (value: string) =>
  value.trim().length >= MIN_REASON_LENGTH ? null : `Give a reason of at least ${MIN_REASON_LENGTH} characters`;

function Problems({ messages }: { messages: string[] }) {
  if (messages.length === 0) return null;
  return (
    <Alert color="red" title="Not resumed">
      {messages.join(' ')}
    </Alert>
  );
}

/** Resuming a paused PCA: a fresh two-nurse reading of the pump, which must equal the order. */
export function ResumeScreen({ orderId }: { orderId: number }) {
  return (
    <BedsideOrderPage orderId={orderId} title="Resume PCA" showRegimen>
      {(order) => <Resume order={order} />}
    </BedsideOrderPage>
  );
}

function Resume({ order }: { order: OrderDetail }) {
  const state = usePauseState(order.id).data;
  const navigate = useNavigate();
  if (!state) return null;
  if (!state.paused) return <OrderNotice title="Not paused">This PCA is running: there is nothing to resume.</OrderNotice>;
  return <ResumeForm order={order} onDone={() => navigate(paths.pca.getHref(order.id))} />;
}

type ResumeValues = {
  reason: string;
  settings: PumpSettingsFormValues;
  witness: { username: string; password: string; settings: PumpSettingsFormValues };
};

function ResumeForm({ order, onDone }: { order: OrderDetail; onDone: () => void }) {
  const resume = useResumePca(order.id);
  // One key per attempt: a double-click or a retry is one resume; after an answer (even a
  // mismatch, which stays paused) the next attempt is a new one.
  const idempotency = useIdempotencyKey();
  const drugs = useDrugs().data ?? [];
  const [problems, setProblems] = useState<string[]>([]);
  const [differences, setDifferences] = useState<PcaPauseState['differences']>([]);
  const form = useForm<ResumeValues>({
    initialValues: {
      reason: '',
      settings: emptyPumpSettingsForm(),
      witness: { username: '', password: '', settings: emptyPumpSettingsForm() },
    },
    validate: {
      reason: reasonRule,
      witness: {
        username: (value) => (value.trim() ? null : 'Enter the username'),
        password: (value) => (value ? null : 'Enter the password'),
      },
    },
  });
  const submit = form.onSubmit((values) => {
    const first = readPumpSettingsForm(values.settings);
    const second = readPumpSettingsForm(values.witness.settings);
    if (!first.settings || !second.settings) {
      form.setErrors({
        ...Object.fromEntries(Object.entries(first.errors).map(([field, message]) => [`settings.${field}`, message])),
        ...Object.fromEntries(Object.entries(second.errors).map(([field, message]) => [`witness.settings.${field}`, message])),
      });
      return;
    }
    resume.mutate(
      {
        request: {
          reason: values.reason.trim(),
          settings: first.settings,
          witness: { username: values.witness.username.trim(), password: values.witness.password, settings: second.settings },
        },
        idempotencyKey: idempotency.key,
      },
      {
        onSuccess: (answer) => {
          idempotency.renew();
          if (answer.differences.length === 0) onDone();
          else setDifferences(answer.differences);
        },
        onError: (error) => setProblems(applyServerErrors(form, error)),
      },
    );
  });
  return (
    <form onSubmit={submit} noValidate>
      <Stack gap="md">
        <Text>Both nurses read the pump independently; both entries must equal the order before it resumes.</Text>
        <Problems messages={problems} />
        {differences.length > 0 && (
          <Alert color="red" title="Still paused: the entries differ from the order">
            {differences
              .map(
                (difference) =>
                  `${PUMP_SETTING_LABELS[difference.field]} (${difference.differs === 'both' ? 'both nurses' : `${difference.differs} nurse`})`,
              )
              .join('; ')}
            . Check the pump, then both enter again.
          </Alert>
        )}
        <Textarea label="Reason for resuming" withAsterisk autosize minRows={2} {...form.getInputProps('reason')} />
        <Title order={3} size="h4">
          Your reading of the pump
        </Title>
        <PumpSettingsFields
          drugs={drugs}
          drugId={form.values.settings.drugId}
          fallbackUnit={order.doseUnit}
          inputProps={(field) => form.getInputProps(`settings.${field}`)}
        />
        <Title order={3} size="h4">
          Second nurse
        </Title>
        <ColleagueFields
          who="Second nurse"
          username={form.getInputProps('witness.username')}
          password={form.getInputProps('witness.password')}
        />
        <PumpSettingsFields
          drugs={drugs}
          drugId={form.values.witness.settings.drugId}
          fallbackUnit={order.doseUnit}
          inputProps={(field) => form.getInputProps(`witness.settings.${field}`)}
        />
        <Group>
          <Button type="submit" loading={resume.isPending}>
            Resume PCA
          </Button>
          <Button variant="subtle" onClick={onDone}>
            Cancel
          </Button>
        </Group>
      </Stack>
    </form>
  );
}
